import type { Job } from "pg-boss";
import { sendMail, type OutgoingMail } from "@/lib/mail/send-mail";
import { runExport } from "@/lib/exports/run-export";
import type { ReviewEvent } from "@/lib/notifications/review-event";
import { resolveReviewMail } from "@/lib/notifications/resolve-review-mail";
import type { QueueName } from "./queues";
import { sendJob } from "./send-job";

/** What the worker does with each queue's jobs. A handler that throws is retried by the queue's policy. */
export const handlers: Record<QueueName, (job: Job<object>) => Promise<void>> = {
  "notify.review": async (job) => {
    const mails = await resolveReviewMail(job.data as ReviewEvent);
    // The singleton key makes a retried fan-out queue each recipient's mail once.
    for (const mail of mails) await sendJob("mail.send", mail, { singletonKey: `${job.id}:${String(mail.to)}` });
  },
  "mail.send": async (job) => {
    await sendMail(job.data as OutgoingMail);
  },
  "export.render": async (job) => {
    await runExport({ exportId: (job.data as { exportId: string }).exportId });
  },
};
