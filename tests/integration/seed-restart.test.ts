// Issue 16 item 9: a restart's seed must not add a demo build again when its author has more
// than one page (100) of builds; it used to look at the first page only.
import pg from "pg";
import { describe, expect, it } from "vitest";
import { seedDemoBuilds } from "@/seed/demo-builds";
import { BASE_URL } from "../support/http";

const TITLE = "8-inch SCT at 0.63× with a camera body on the EF bayonet"; // the member's demo build

describe("demo builds on restart", () => {
  it("finds the demo build past the first page and does not add it twice", async () => {
    const db = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await db.connect();
    const count = async () => Number((await db.query("SELECT count(*) FROM builds WHERE title = $1", [TITLE])).rows[0].count);
    // The test runner seeds the catalog but not the demo builds: seed them here, and remove
    // afterwards whatever this test added, so the other suites see the database as it was.
    const before = new Set((await db.query("SELECT id FROM builds")).rows.map((r) => r.id as string));
    try {
      await seedDemoBuilds(BASE_URL, () => {});
      expect(await count()).toBe(1);
      // 101 newer private builds of the same author push the demo build off the first page.
      await db.query(`
        INSERT INTO builds (slug, owner_id, title, visibility, request, solution_index, result, part_ids, fits, created_at, updated_at)
        SELECT 'Bulk' || substr(md5(random()::text || g::text), 1, 10), b.owner_id, 'Bulk copy ' || g, 'private', b.request, b.solution_index, b.result, '{}', b.fits, now() + g * interval '1 ms', now()
        FROM builds b, generate_series(1, 101) g WHERE b.title = $1`, [TITLE]);
      await seedDemoBuilds(BASE_URL, () => {});
      expect(await count()).toBe(1);
    } finally {
      await db.query("DELETE FROM builds WHERE NOT (id = ANY($1::text[]))", [[...before]]);
      await db.end();
    }
  });
});
