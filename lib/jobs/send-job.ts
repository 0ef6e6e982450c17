import { boss } from "./boss";
import { queues, type QueueName } from "./queues";

/** Queues one job with its queue's retry policy; resolves to the job id. */
export async function sendJob(name: QueueName, data: object, options: { singletonKey?: string } = {}): Promise<string | null> {
  return (await boss()).send(name, data, { ...queues[name], ...options });
}
