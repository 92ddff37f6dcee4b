// Backups of the project's database with PostgreSQL's own tools: pg_dump in custom format,
// pg_restore into a fresh database (the previous one is kept aside, never dropped).
import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync } from "node:fs";
import path from "node:path";
import pg from "pg";
import { findBinDir } from "@/db/server";

function tool(name: "pg_dump" | "pg_restore"): string {
  const dir = findBinDir();
  const bin = dir ? path.join(dir, name) : name;
  return dir && existsSync(bin) ? bin : name;
}

const stamp = (d = new Date()) => d.toISOString().replace(/\.\d+Z$/, "Z").replace(/[-:]/g, "").replace("T", "-");
const quoteIdent = (name: string) => `"${name.replace(/"/g, '""')}"`;

/** Write `<dir>/<database>-<UTC timestamp>.dump` and return its path. */
export function backupDatabase({ url, dir }: { url: string; dir: string }): string {
  mkdirSync(dir, { recursive: true });
  const database = new URL(url).pathname.slice(1) || "postgres";
  const file = path.join(dir, `${database}-${stamp()}.dump`);
  const r = spawnSync(tool("pg_dump"), ["--format=custom", "--no-owner", "--file", file, "--dbname", url], { encoding: "utf8" });
  if (r.status !== 0) throw new Error(`pg_dump failed:\n${r.stderr || r.error?.message}`);
  return file;
}

/**
 * Restore `file` as `database` on the server at `adminUrl`. An existing database of that name
 * is renamed to `<database>_before_restore_<timestamp>` first (its connections are closed),
 * so a restore never destroys anything. Returns the name the old database was kept under.
 */
export async function restoreDatabase({ adminUrl, database, file }: { adminUrl: string; database: string; file: string }): Promise<string | null> {
  if (!existsSync(file)) throw new Error(`No such backup: ${file}`);
  if (!/^[a-z_][a-z0-9_]*$/.test(database)) throw new Error(`Not a plain database name: ${database}`);
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  let keptAs: string | null = null;
  try {
    const { rowCount } = await client.query("SELECT 1 FROM pg_database WHERE datname = $1", [database]);
    if (rowCount) {
      keptAs = `${database}_before_restore_${stamp().replace(/\D/g, "")}`.slice(0, 63);
      await client.query("SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE datname = $1 AND pid <> pg_backend_pid()", [database]);
      await client.query(`ALTER DATABASE ${quoteIdent(database)} RENAME TO ${quoteIdent(keptAs)}`);
    }
    await client.query(`CREATE DATABASE ${quoteIdent(database)}`);
  } finally {
    await client.end();
  }
  const target = new URL(adminUrl);
  target.pathname = `/${database}`;
  const r = spawnSync(tool("pg_restore"), ["--no-owner", "--exit-on-error", "--dbname", target.toString(), file], { encoding: "utf8" });
  if (r.status !== 0) throw new Error(`pg_restore failed${keptAs ? ` (the previous database is kept as ${keptAs})` : ""}:\n${r.stderr || r.error?.message}`);
  return keptAs;
}
