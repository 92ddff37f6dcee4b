import "server-only";
// The job worker. It runs inside each app process (started by instrumentation.ts when the Next.js
// server boots), so `npm start`, `npm test` and every instance behind a load balancer work the
// same queue; pg-boss hands each job to one worker (SKIP LOCKED).
import { getBuildById } from "@/db/queries/builds";
import { recheckBuild } from "@/lib/builds/recheck";
import { deliverMail } from "@/lib/mail";
import { getBoss, QUEUES, type MailJob } from "./queue";

const globalForWorker = globalThis as unknown as { trainyardWorker?: boolean };

/**
 * Work a queue in batches (pg-boss waits a polling interval between fetches, so one job per
 * fetch would cap it at two a second). Each job succeeds or fails on its own: a failed one is
 * handed back for a retry, the rest of the batch completes.
 */
async function workEach<T extends object>(name: string, run: (data: T) => Promise<void>) {
  const boss = await getBoss();
  // Poll twice a second: mail links should arrive while the person is still looking.
  await boss.work<T>(name, { pollingIntervalSeconds: 0.5, batchSize: 20 }, async (jobs) => {
    for (const job of jobs) {
      try {
        await run(job.data);
      } catch (err) {
        console.error(`[jobs] ${name} ${job.id} failed, will retry: ${(err as Error).message}`);
        await boss.fail(name, job.id, { message: (err as Error).message });
      }
    }
  });
}

async function startOnce() {
  await workEach<MailJob>(QUEUES.mail.name, deliverMail);
  await workEach<{ buildId: string }>(QUEUES.recheck.name, async ({ buildId }) => {
    const build = await getBuildById({ id: buildId });
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
