// Starts Debian's PostgreSQL for this checkout: cluster in .data/postgres, 127.0.0.1 only,
// run as the `postgres` user when we are root (the server refuses to run as root).
import { execFileSync, spawnSync } from "node:child_process";
import { chmodSync, chownSync, existsSync, mkdirSync, readFileSync, readdirSync, statSync, writeFileSync } from "node:fs";
import net from "node:net";
import path from "node:path";
import pg from "pg";

export type PgServer = { url: (database: string) => string; port: number; stop: () => void; started: boolean };

const isRoot = () => typeof process.getuid === "function" && process.getuid() === 0;

export function findBinDir(): string | null {
  const candidates: string[] = [];
  try {
    const out = execFileSync("pg_config", ["--bindir"], { encoding: "utf8", stdio: ["ignore", "pipe", "ignore"] }).trim();
    if (out) candidates.push(out);
  } catch { /* not installed */ }
  const base = "/usr/lib/postgresql";
  if (existsSync(base)) {
    for (const v of readdirSync(base).sort((a, b) => Number(b) - Number(a))) candidates.push(path.join(base, v, "bin"));
  }
  return candidates.find((dir) => existsSync(path.join(dir, "initdb")) && existsSync(path.join(dir, "pg_ctl"))) ?? null;
}

function ensureBinaries(log: (m: string) => void): string {
  let dir = findBinDir();
  if (dir) return dir;
  if (!isRoot()) {
    throw new Error("PostgreSQL server binaries (initdb, pg_ctl) were not found. Install them with `sudo apt-get install -y postgresql`, or set DATABASE_URL to an existing server.");
  }
  log("Installing Debian's postgresql package (binaries were missing)…");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  spawnSync("apt-get", ["update", "-qq"], { stdio: "inherit", env });
  const r = spawnSync("apt-get", ["install", "-y", "-qq", "postgresql"], { stdio: "inherit", env });
  if (r.status !== 0) throw new Error("apt-get install postgresql failed; install it by hand or set DATABASE_URL.");
  dir = findBinDir();
  if (!dir) throw new Error("postgresql installed, but initdb/pg_ctl are still not found.");
  return dir;
}

function runAsOwner(bin: string, args: string[], opts: { quiet?: boolean } = {}) {
  const cmd = isRoot() ? "runuser" : bin;
  const full = isRoot() ? ["-u", "postgres", "--", bin, ...args] : args;
  const r = spawnSync(cmd, full, { encoding: "utf8", stdio: opts.quiet ? "pipe" : ["ignore", "pipe", "pipe"] });
  return { ok: r.status === 0, out: `${r.stdout ?? ""}${r.stderr ?? ""}` };
}

function chownTree(target: string, uid: number, gid: number) {
  chownSync(target, uid, gid);
}

/**
 * Start (or reuse) the project's cluster. Idempotent: when the server in `dataDir` already
 * runs, it is reused and `stop` leaves it alone.
 */
function portIsFree(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const srv = net.createServer();
    srv.once("error", () => resolve(false));
    srv.listen(port, "127.0.0.1", () => srv.close(() => resolve(true)));
  });
}

async function pickPort(preferred: number | undefined): Promise<number> {
  if (preferred !== undefined) return preferred;
  for (let port = 54329; port < 54429; port++) if (await portIsFree(port)) return port;
  throw new Error("No free port for PostgreSQL between 54329 and 54428: set PGPORT.");
}

/**
 * `port` undefined: 54329, or the next free one when another cluster already holds it.
 *
 * `throwaway` is for the test runner alone: its own cluster (.data/postgres-test) with fsync
 * and synchronous commit off, for speed, because nothing in it needs to survive a crash. The
 * cluster `npm start` and `npm run dev` use keeps PostgreSQL's durable defaults: with fsync
 * off an operating-system crash can corrupt the whole cluster (issue 15).
 */
export async function startPostgres(opts: { root: string; port?: number; throwaway?: boolean; log?: (m: string) => void }): Promise<PgServer> {
  const log = opts.log ?? ((m) => console.log(`[postgres] ${m}`));
  const bin = ensureBinaries(log);
  const dataRoot = path.join(opts.root, ".data");
  const dataDir = path.join(dataRoot, opts.throwaway ? "postgres-test" : "postgres");
  mkdirSync(dataRoot, { recursive: true });
  let uid = 0, gid = 0;
  if (isRoot()) {
    uid = Number(execFileSync("id", ["-u", "postgres"], { encoding: "utf8" }).trim());
    gid = Number(execFileSync("id", ["-g", "postgres"], { encoding: "utf8" }).trim());
    // The postgres user must be able to pass through the folders above the cluster (a
    // checkout under a private temporary folder, say): add only the traverse bit.
    for (let dir = dataRoot; dir !== path.dirname(dir); dir = path.dirname(dir)) {
      try {
        const mode = statSync(dir).mode & 0o7777;
        if ((mode & 0o001) === 0) chmodSync(dir, mode | 0o001);
      } catch { /* best effort for parents we cannot change */ }
    }
  }
  if (!existsSync(path.join(dataDir, "PG_VERSION"))) {
    mkdirSync(dataDir, { recursive: true });
    if (isRoot()) chownTree(dataDir, uid, gid);
    chmodSync(dataDir, 0o700);
    log(`initialising a cluster in ${dataDir}`);
    const init = runAsOwner(path.join(bin, "initdb"), ["-D", dataDir, "-U", "postgres", "--auth=trust", "-E", "UTF8", "--no-locale"]);
    if (!init.ok) throw new Error(`initdb failed:\n${init.out}`);
  }
  const status = runAsOwner(path.join(bin, "pg_ctl"), ["-D", dataDir, "status"], { quiet: true });
  let started = false;
  let port: number;
  if (status.ok) {
    // Already running for this checkout: its port is line 4 of postmaster.pid.
    port = Number(readFileSync(path.join(dataDir, "postmaster.pid"), "utf8").split("\n")[3]);
    if (opts.port !== undefined && port !== opts.port) log(`the cluster already runs on port ${port}; using that instead of ${opts.port}`);
    log(`reusing the running cluster on 127.0.0.1:${port}`);
  } else {
    port = await pickPort(opts.port);
    const logFile = path.join(dataRoot, opts.throwaway ? "postgres-test.log" : "postgres.log");
    writeFileSync(logFile, "", { flag: "a" });
    if (isRoot()) chownSync(logFile, uid, gid);
    const speed = opts.throwaway ? " -c fsync=off -c synchronous_commit=off -c full_page_writes=off" : "";
    const o = `-c listen_addresses=127.0.0.1 -p ${port} -k ${dataDir} -c max_connections=200${speed}`;
    const r = runAsOwner(path.join(bin, "pg_ctl"), ["-D", dataDir, "-l", logFile, "-o", o, "-w", "-t", "60", "start"]);
    if (!r.ok) throw new Error(`PostgreSQL did not start (see ${logFile}):\n${r.out}`);
    started = true;
    log(`listening on 127.0.0.1:${port}`);
  }
  const url = (database: string) => `postgres://postgres@127.0.0.1:${port}/${database}`;
  if (!started && !opts.throwaway) await warnIfNotDurable(url("postgres"), log);
  return {
    url, port, started,
    stop: () => {
      if (!started) return;
      runAsOwner(path.join(bin, "pg_ctl"), ["-D", dataDir, "-m", "fast", "-w", "stop"], { quiet: true });
    },
  };
}

/** A reused cluster may have been started by an older version with fsync off: say so plainly. */
async function warnIfNotDurable(adminUrl: string, log: (m: string) => void) {
  const client = new pg.Client({ connectionString: adminUrl });
  try {
    await client.connect();
    const fsync = (await client.query("SHOW fsync")).rows[0].fsync;
    const commit = (await client.query("SHOW synchronous_commit")).rows[0].synchronous_commit;
    if (fsync === "off" || commit === "off") {
      log(`WARNING: this running cluster has fsync=${fsync}, synchronous_commit=${commit}: a crash could lose or corrupt data. Stop it (Ctrl-C every npm start, or pg_ctl -D .data/postgres stop) and start again to get the durable defaults.`);
    }
  } catch { /* the caller's own connection reports real problems */ } finally {
    await client.end().catch(() => {});
  }
}

export async function ensureDatabase(adminUrl: string, database: string, opts: { fresh?: boolean } = {}) {
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    const safe = database.replace(/[^a-z0-9_]/g, "");
    if (opts.fresh) await client.query(`DROP DATABASE IF EXISTS "${safe}" WITH (FORCE)`);
    const { rowCount } = await client.query("SELECT 1 FROM pg_database WHERE datname = $1", [safe]);
    if (!rowCount) await client.query(`CREATE DATABASE "${safe}"`);
  } finally {
    await client.end();
  }
}

export async function dropDatabase(adminUrl: string, database: string) {
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try { await client.query(`DROP DATABASE IF EXISTS "${database.replace(/[^a-z0-9_]/g, "")}" WITH (FORCE)`); }
  finally { await client.end(); }
}
