// Re-check jobs are written in the transaction of the change they follow: a rolled-back change
// leaves no job behind, a committed one leaves exactly its jobs (lib/jobs/queue.ts `jobsIn`).
import { sql } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { enqueueRechecks, getBoss } from "@/lib/jobs/queue";
import { testDb } from "../support/seed-users";

const { db, pool } = testDb();
afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
  await pool.end();
});

const jobsFor = async (buildId: string) =>
  (await db.execute(sql`select name, singleton_key from pgboss.job where data->>'buildId' = ${buildId}`)).rows;

describe("re-check jobs in the caller's transaction", () => {
  it("are gone when the transaction rolls back", async () => {
    const buildId = crypto.randomUUID();
    await expect(db.transaction(async (tx) => {
      expect(await enqueueRechecks([buildId], tx)).toBe(1);
      // Inside the transaction the job is visible…
      expect((await tx.execute(sql`select 1 from pgboss.job where data->>'buildId' = ${buildId}`)).rows).toHaveLength(1);
      throw new Error("the part update failed");
    })).rejects.toThrow("the part update failed");
    // …and after the rollback it never existed.
    expect(await jobsFor(buildId)).toEqual([]);
  });

  it("are there once the transaction commits, one per build", async () => {
    const a = crypto.randomUUID();
    const b = crypto.randomUUID();
    await db.transaction(async (tx) => { await enqueueRechecks([a, b], tx); });
    expect(await jobsFor(a)).toEqual([{ name: "build-recheck", singleton_key: a }]);
    expect(await jobsFor(b)).toHaveLength(1);
  });
});
