// `npm run worker`: works the job queues (review e-mail, export rendering). Several workers may
// run on several machines against the same database; each job is worked once.
import { closeDb } from "@/db/knex";
import { stopBoss } from "@/lib/jobs/boss";
import { workQueues } from "@/lib/jobs/work-queues";
import { closeBrowser } from "@/lib/report/pdf/browser";

const names = await workQueues();
console.log(`worker: working ${names.join(", ")}`);

let stopping = false;
async function stop(signal: string) {
  if (stopping) return;
  stopping = true;
  console.log(`worker: ${signal}, finishing the jobs in hand`);
  await stopBoss();
  // Chromium is a child of this process; leave none behind.
  await closeBrowser().catch(() => undefined);
  await closeDb();
  process.exit(0);
}
process.on("SIGTERM", () => void stop("SIGTERM"));
process.on("SIGINT", () => void stop("SIGINT"));
