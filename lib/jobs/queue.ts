import "server-only";
// The durable job queue (pg-boss, in the app's own PostgreSQL): e-mails and build re-checks are
// stored as jobs first and done by the worker (lib/jobs/worker.ts), with retries, so a mail
// server that is down loses nothing and a crash in the middle of a re-check resumes.
import { type SQL, sql } from "drizzle-orm";
import PgBoss from "pg-boss";

export const QUEUES = {
  /** One message; retried with backoff for about a day before it counts as failed. */
  mail: { name: "mail", retryLimit: 25, retryDelay: 5, retryBackoff: true, expireInSeconds: 60 },
  /** One build re-solved against today's catalog; at most one waiting per build. */
  recheck: { name: "build-recheck", policy: "short", retryLimit: 10, retryDelay: 5, retryBackoff: true, expireInSeconds: 30 },
} as const satisfies Record<string, PgBoss.Queue>;

const globalForBoss = globalThis as unknown as { trainyardBoss?: Promise<PgBoss> };

async function startBoss(): Promise<PgBoss> {
  const connectionString = process.env.DATABASE_URL;
  if (!connectionString) throw new Error("DATABASE_URL is not set");
  // Maintenance every 10 s: a job held by a process that died is handed out again soon after
  // its expiry (30–60 s), not minutes later.
  const boss = new PgBoss({ connectionString, max: 4, application_name: "trainyard-jobs", maintenanceIntervalSeconds: 10 });
  boss.on("error", (err) => console.error("job queue:", err.message));
  await boss.start();
  for (const q of Object.values(QUEUES)) await boss.createQueue(q.name, q);
  return boss;
}

/** The started queue, shared by the process. A failed start (database down) is retried on next use. */
export function getBoss(): Promise<PgBoss> {
  globalForBoss.trainyardBoss ??= startBoss().catch((err) => {
    globalForBoss.trainyardBoss = undefined;
    throw err;
  });
  return globalForBoss.trainyardBoss;
}

export type MailJob = { to: string; subject: string; text: string; html?: string };

export async function enqueueMail(message: MailJob): Promise<void> {
  const boss = await getBoss();
  await boss.send(QUEUES.mail.name, message);
}

/** Anything that runs drizzle SQL: the pool or an open transaction. */
type Executes = { execute: (query: SQL) => Promise<{ rows: unknown[] }> };

/**
 * pg-boss's connection option over a drizzle transaction, so that a job is written in the same
 * transaction as the change it follows (both or neither). pg-boss hands over numbered
 * placeholders ($1, $2…); each becomes a drizzle parameter, through drizzle's public `sql` API (undefined as NULL, as
 * node-postgres would send it).
 */
export function jobsIn(tx: Executes): PgBoss.Db {
  return {
    async executeSql(text, values) {
      const pieces = text.split(/\$(\d+)/);
      const chunks = pieces.map((piece, i) => (i % 2 ? sql`${sql.param(values[Number(piece) - 1] ?? null)}` : sql.raw(piece)));
      const res = await tx.execute(sql.join(chunks));
      return { rows: res.rows };
    },
  };
}

/**
 * Queue a re-check of each build; a build already waiting is not queued twice. With `tx` the jobs
 * are written in that transaction (they exist exactly when it commits).
 */
export async function enqueueRechecks(buildIds: string[], tx?: Executes): Promise<number> {
  if (!buildIds.length) return 0;
  const boss = await getBoss();
  const jobs = buildIds.map((buildId) => ({ name: QUEUES.recheck.name, data: { buildId }, singletonKey: buildId }));
  if (tx) await boss.insert(jobs, { db: jobsIn(tx) });
  else await boss.insert(jobs);
  return buildIds.length;
}
