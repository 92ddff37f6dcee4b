// Issue 15: the cluster `npm start` runs keeps PostgreSQL's durable defaults (only the test
// runner's throwaway cluster turns fsync and synchronous commit off), and a backup made with
// `npm run db:backup` brings back a build that was deleted after it.
import { spawnSync } from "node:child_process";
import { existsSync, rmSync } from "node:fs";
import path from "node:path";
import pg from "pg";
import { describe, expect, it } from "vitest";
import { dropDatabase, startPostgres } from "@/db/server";
import { freePort } from "@/lib/dev/services";
import { signedIn } from "../support/http";
import { saveBuild } from "./builds-support";

const root = path.resolve(import.meta.dirname, "..", "..");
const tsx = (script: string, args: string[], input?: string) => spawnSync(process.execPath, ["--import", "tsx", path.join(root, script), ...args], {
  cwd: root, encoding: "utf8", env: process.env, input, timeout: 120_000,
});

async function settings(url: string) {
  const c = new pg.Client({ connectionString: url });
  await c.connect();
  try {
    return { fsync: (await c.query("SHOW fsync")).rows[0].fsync, synchronousCommit: (await c.query("SHOW synchronous_commit")).rows[0].synchronous_commit };
  } finally { await c.end(); }
}

describe("durable PostgreSQL settings", () => {
  it("starts the npm start cluster with fsync and synchronous commit on", async () => {
    // The same function npm start calls, on a cluster of its own (a private folder and port).
    const scratch = path.join(root, ".data", `durability-${process.pid}`);
    const server = await startPostgres({ root: scratch, port: await freePort(), log: () => {} });
    try {
      expect(await settings(server.url("postgres"))).toEqual({ fsync: "on", synchronousCommit: "on" });
    } finally {
      server.stop();
      rmSync(scratch, { recursive: true, force: true });
    }
  }, 120_000);

  it("runs the app's own database durably unless it is the test runner's throwaway cluster", async () => {
    const s = await settings(process.env.DATABASE_URL!);
    if (process.env.TRAINYARD_TEST_RUNNER === "1") expect(s).toEqual({ fsync: "off", synchronousCommit: "off" });
    else expect(s).toEqual({ fsync: "on", synchronousCommit: "on" });
  });
});

describe("npm run db:backup and db:restore", () => {
  it("backs up, loses a build, restores, and finds the build again", async () => {
    const member = await signedIn("member@trainyard.test");
    const slug = await saveBuild(member, "private");

    const backup = tsx("lib/dev/db-backup.ts", []);
    expect(backup.status, backup.stderr).toBe(0);
    const file = /Backup written: (\S+)/.exec(backup.stdout)?.[1];
    expect(file).toMatch(/\.data\/backups\/[a-z0-9_]+-\d{8}-\d{6}Z\.dump$/);
    const dump = path.resolve(root, file!);
    const restoredDb = `trainyard_restore_${process.pid}`;
    const adminUrl = process.env.DATABASE_URL!.replace(/\/[^/]+$/, "/postgres");
    try {
      expect((await member.delete(`/api/v1/builds/${slug}`)).status).toBe(204);

      // Without --yes it asks, and a "no" restores nothing.
      const refused = tsx("lib/dev/db-restore.ts", [dump, "--database", restoredDb], "no\n");
      expect(refused.status).toBe(1);
      expect(refused.stdout).toContain("Nothing restored");

      const restored = tsx("lib/dev/db-restore.ts", [dump, "--yes", "--database", restoredDb]);
      expect(restored.status, restored.stderr).toBe(0);
      const c = new pg.Client({ connectionString: process.env.DATABASE_URL!.replace(/\/[^/]+$/, `/${restoredDb}`) });
      await c.connect();
      try {
        const { rows } = await c.query("SELECT slug FROM builds WHERE slug = $1", [slug]);
        expect(rows).toEqual([{ slug }]);
      } finally { await c.end(); }
      // The live database really lost it.
      expect((await member.get(`/api/v1/builds/${slug}`)).status).toBe(404);
    } finally {
      await dropDatabase(adminUrl, restoredDb);
      if (existsSync(dump)) rmSync(dump);
    }
  }, 180_000);
});
