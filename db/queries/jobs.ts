import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db/client";
import { QUEUES } from "@/lib/jobs/queue";

export type PendingMail = { id: string; to: string; subject: string; state: string; retryCount: number; createdOn: Date; startAfter: Date };

/** Messages the worker has not delivered yet (waiting, retrying after a failure, or being sent). */
export async function listPendingMail({ limit = 100 }: { limit?: number } = {}): Promise<PendingMail[]> {
  // pg-boss creates its schema when the worker first starts: before that nothing is pending.
  const exists = await db.execute(sql`select to_regclass('pgboss.job') is not null as ok`);
  if (!(exists.rows[0] as { ok: boolean }).ok) return [];
  const { rows } = await db.execute(sql`
    select id, data->>'to' as "to", data->>'subject' as subject, state::text as state, retry_count as "retryCount",
           created_on as "createdOn", start_after as "startAfter"
    from pgboss.job where name = ${QUEUES.mail.name} and state in ('created', 'retry', 'active')
    order by created_on desc limit ${limit}`);
  return (rows as PendingMail[]).map((r) => ({ ...r, createdOn: new Date(r.createdOn), startAfter: new Date(r.startAfter) }));
}
