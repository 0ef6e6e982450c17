// `npm run worker`: works the job queues (review e-mail now; exports later). Several workers may
// run on several machines against the same database; each job is worked once.
import { closeDb } from "@/db/knex";
import { boss, stopBoss, superviseQueues } from "@/lib/jobs/boss";
import { handlers } from "@/lib/jobs/handlers";
import type { QueueName } from "@/lib/jobs/queues";

superviseQueues();
const b = await boss();
for (const name of Object.keys(handlers) as QueueName[]) {
  await b.work<object>(name, { pollingIntervalSeconds: 1 }, async (jobs) => {
    for (const job of jobs) await handlers[name](job);
  });
}
console.log(`worker: working ${Object.keys(handlers).join(", ")}`);

let stopping = false;
async function stop(signal: string) {
  if (stopping) return;
  stopping = true;
  console.log(`worker: ${signal}, finishing the jobs in hand`);
  await stopBoss();
  await closeDb();
  process.exit(0);
}
process.on("SIGTERM", () => void stop("SIGTERM"));
process.on("SIGINT", () => void stop("SIGINT"));
