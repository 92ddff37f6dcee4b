import "server-only";
// The job worker. It runs inside each app process (started by instrumentation.ts when the Next.js
// server boots), so `npm start`, `npm test` and every instance behind a load balancer work the
// same queue; pg-boss hands each job to one worker (SKIP LOCKED).
import { getBuildById } from "@/db/queries/builds";
import { recheckBuild } from "@/lib/builds/recheck";
import { deliverMail } from "@/lib/mail";
import { getBoss, QUEUES, type MailJob } from "./queue";

const globalForWorker = globalThis as unknown as { trainyardWorker?: boolean };

async function startOnce() {
  const boss = await getBoss();
  // Poll twice a second: mail links should arrive while the person is still looking.
  await boss.work<MailJob>(QUEUES.mail.name, { pollingIntervalSeconds: 0.5 }, async ([job]) => {
    await deliverMail(job.data);
  });
  await boss.work<{ buildId: string }>(QUEUES.recheck.name, { pollingIntervalSeconds: 0.5 }, async ([job]) => {
    const build = await getBuildById({ id: job.data.buildId });
    if (build) await recheckBuild(build);
  });
}

/** Start the workers; while the database is unreachable, keep trying in the background. */
export function startWorkers() {
  if (globalForWorker.trainyardWorker) return;
  globalForWorker.trainyardWorker = true;
  const attempt = (delayMs: number) => {
    startOnce().then(() => console.log("[jobs] worker started (mail, build re-checks)"), (err) => {
      console.error(`[jobs] worker not started (${(err as Error).message}); retrying`);
      setTimeout(() => attempt(Math.min(delayMs * 2, 30_000)), delayMs);
    });
  };
  attempt(1_000);
}
