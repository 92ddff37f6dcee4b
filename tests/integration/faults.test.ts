// Faults, against an app process and PostgreSQL cluster of this file's own (the shared ones the
// rest of the suite uses are never stopped): PostgreSQL stopped under a write loop and started
// again, and the server killed with SIGKILL in the middle of writes and restarted. Every save
// the app acknowledged must be there, complete; nothing may be half-written; while the database
// is down clients get a quick 503 with a JSON error, never a hang.
import { spawnSync, type ChildProcess } from "node:child_process";
import { readdirSync } from "node:fs";
import path from "node:path";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { migrateDatabase } from "@/db/migrate";
import { ensureDatabase, startPostgres, type PgServer } from "@/db/server";
import { startMailFake } from "@/lib/dev/mail-fake";
import { serveApp, waitForHealth } from "@/lib/dev/next-process";
import { freePort } from "@/lib/dev/services";
import { seedDemo } from "@/seed/index";
import { flagshipRequest } from "./builds-support";

const repo = path.resolve(import.meta.dirname, "..", "..");
// Its own cluster folder (startPostgres keeps it in <root>/.data/postgres).
const clusterRoot = path.join(repo, ".data", "faults");
const DATABASE = "trainyard_faults";
const TITLE = `Fault loop ${Date.now()}`;

let server: PgServer;

/** Stop this file's cluster even when startPostgres reused one left running (its stop() would not). */
function stopCluster() {
  const bin = readdirSync("/usr/lib/postgresql").sort((a, b) => Number(b) - Number(a)).map((v) => `/usr/lib/postgresql/${v}/bin/pg_ctl`)[0];
  const args = ["-D", path.join(clusterRoot, ".data", "postgres"), "-m", "fast", "-w", "stop"];
  const asRoot = process.getuid?.() === 0;
  spawnSync(asRoot ? "runuser" : bin, asRoot ? ["-u", "postgres", "--", bin, ...args] : args, { stdio: "ignore" });
}
let pgPort: number;
let app: ChildProcess | undefined;
let appPort: number;
let base: string;
let env: NodeJS.ProcessEnv;
let stopMail: () => Promise<void>;
let mailPort: number;
let cookie = "";
let appLog = "";

async function startApp() {
  app = serveApp(repo, { port: appPort, dev: false, env, quiet: true });
  app.stdout?.on("data", (d) => { appLog = (appLog + d).slice(-6000); });
  app.stderr?.on("data", (d) => { appLog = (appLog + d).slice(-6000); });
  await waitForHealth(base, 90_000);
}

async function killApp(signal: NodeJS.Signals) {
  if (!app || app.exitCode !== null) return;
  const exited = new Promise((r) => app!.once("exit", r));
  app.kill(signal);
  await exited;
}

async function signIn(email = "member@trainyard.test"): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in/email`, {
    method: "POST", headers: { "content-type": "application/json", origin: base },
    body: JSON.stringify({ email, password: process.env.DEMO_PASSWORD ?? "trainyard-demo" }),
  });
  expect(res.status).toBe(200);
  const got = res.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  if (email === "member@trainyard.test") cookie = got;
  return got;
}

type Outcome = { title: string; status: number; slug?: string; code?: string; ms: number; failed?: string };

/** One save, with a deadline: a hang counts as a failure, not a wait. */
async function save(title: string): Promise<Outcome> {
  const t0 = Date.now();
  try {
    const res = await fetch(`${base}/api/v1/builds`, {
      method: "POST", headers: { "content-type": "application/json", origin: base, cookie },
      body: JSON.stringify({ title, visibility: "private", request: flagshipRequest, solutionIndex: 0 }),
      signal: AbortSignal.timeout(15_000),
    });
    const body = (await res.json().catch(() => null)) as { slug?: string; error?: { code: string; message: string } } | null;
    // A 201 whose body never arrived (the server died mid-answer) is not an acknowledgement.
    if (!body) return { title, status: 0, failed: "cut off", ms: Date.now() - t0 };
    return { title, status: res.status, slug: body.slug, code: body.error?.code, ms: Date.now() - t0 };
  } catch (err) {
    return { title, status: 0, failed: (err as Error).name, ms: Date.now() - t0 };
  }
}

async function rows(prefix: string) {
  const client = new pg.Client({ connectionString: server.url(DATABASE) });
  await client.connect();
  try {
    const { rows: found } = await client.query<{ slug: string; title: string; has_result: boolean; parts: number; has_request: boolean }>(
      "select slug, title, result is not null as has_result, coalesce(array_length(part_ids, 1), 0) as parts, request is not null as has_request from builds where title like $1",
      [`${prefix}%`]);
    return found;
  } finally {
    await client.end();
  }
}

beforeAll(async () => {
  pgPort = await freePort();
  server = await startPostgres({ root: clusterRoot, port: pgPort, log: () => {} });
  pgPort = server.port;
  await ensureDatabase(server.url("postgres"), DATABASE, { fresh: true });
  await migrateDatabase(server.url(DATABASE));
  await seedDemo(server.url(DATABASE), () => {});
  mailPort = await freePort();
  const mail = await startMailFake({ port: mailPort, databaseUrl: server.url(DATABASE) });
  stopMail = mail.stop;
  appPort = await freePort();
  base = `http://127.0.0.1:${appPort}`;
  env = {
    ...process.env, DATABASE_URL: server.url(DATABASE), SMTP_URL: mail.url, TRAINYARD_MAIL_FAKE: "1", PORT: String(appPort),
    BETTER_AUTH_URL: base, BETTER_AUTH_SECRET: `faults-${crypto.randomUUID()}${crypto.randomUUID()}`, TRAINYARD_RATE_LIMIT: "0",
  };
  await startApp();
  await signIn();
}, 180_000);

afterAll(async () => {
  await killApp("SIGTERM");
  await stopMail?.().catch(() => {});
  stopCluster();
  if (appLog && process.env.TRAINYARD_FAULTS_LOG) console.log(appLog);
});

describe("PostgreSQL stops under a write loop", () => {
  it("answers 503 with a JSON error while it is down, recovers without a restart, and loses no acknowledged save", async () => {
    const prefix = `${TITLE} pg`;
    const outcomes: Outcome[] = [];
    let n = 0;
    let phase: "up" | "down" | "back" = "up";
    let stopAt = Infinity;
    const loop = (async () => {
      while (Date.now() < stopAt) {
        const o = await save(`${prefix} ${n++}`);
        outcomes.push({ ...o, title: `${phase}:${o.title}` });
      }
    })();
    await new Promise((r) => setTimeout(r, 2_000));
    stopCluster();
    phase = "down";
    await new Promise((r) => setTimeout(r, 4_000));
    server = await startPostgres({ root: clusterRoot, port: pgPort, log: () => {} });
    phase = "back";
    // Recovery: the loop keeps going until saves succeed again (or 45 s pass).
    const deadline = Date.now() + 45_000;
    while (Date.now() < deadline && !outcomes.some((o) => o.title.startsWith("back:") && o.status === 201)) await new Promise((r) => setTimeout(r, 250));
    stopAt = Date.now() + 1_500;
    await loop;

    const byPhase = (p: string) => outcomes.filter((o) => o.title.startsWith(`${p}:`));
    expect(byPhase("up").some((o) => o.status === 201)).toBe(true);
    const down = byPhase("down");
    expect(down.length, "requests were made while PostgreSQL was down").toBeGreaterThan(0);
    for (const o of down) {
      // A save that raced the shutdown may still have landed; anything else is a clear 503.
      expect([201, 503], JSON.stringify(o)).toContain(o.status);
      if (o.status === 503) expect(o.code).toMatch(/^unavailable/);
      expect(o.ms, "no hang").toBeLessThan(15_000);
    }
    expect(down.filter((o) => o.status === 503).length).toBeGreaterThan(0);
    expect(byPhase("back").some((o) => o.status === 201), "saves work again without restarting the app").toBe(true);
    expect(outcomes.filter((o) => o.status === 0 || o.status >= 500 && o.status !== 503), "only 503 while down").toEqual([]);

    const stored = await rows(prefix);
    const bySlug = new Map(stored.map((r) => [r.slug, r]));
    for (const o of outcomes.filter((x) => x.status === 201)) expect(bySlug.has(o.slug!), `acknowledged ${o.slug} is stored`).toBe(true);
    for (const r of stored) expect(r.has_result && r.has_request && r.parts > 0, `${r.slug} is complete`).toBe(true);
    // The health check agrees once it is back.
    expect((await fetch(`${base}/api/health`)).status).toBe(200);
  }, 120_000);
});

describe("the server is killed mid-write", () => {
  it("keeps every acknowledged save, complete, after SIGKILL and a restart", async () => {
    const prefix = `${TITLE} kill`;
    const outcomes: Outcome[] = [];
    let n = 0;
    let running = true;
    // Four writers at once, so the kill lands while some saves are in flight.
    const writers = Array.from({ length: 4 }, async () => {
      while (running) outcomes.push(await save(`${prefix} ${n++}`));
    });
    await new Promise((r) => setTimeout(r, 3_000));
    await killApp("SIGKILL");
    running = false;
    await Promise.all(writers);

    const acknowledged = outcomes.filter((o) => o.status === 201);
    expect(acknowledged.length).toBeGreaterThan(0);
    expect(outcomes.some((o) => o.status === 0), "some saves were cut off by the kill").toBe(true);

    await startApp();
    const stored = await rows(prefix);
    const bySlug = new Map(stored.map((r) => [r.slug, r]));
    for (const o of acknowledged) expect(bySlug.get(o.slug!)?.title, `acknowledged ${o.slug}`).toBe(o.title);
    for (const r of stored) expect(r.has_result && r.has_request && r.parts > 0, `${r.slug} is complete`).toBe(true);
    // And the restarted app serves them.
    const res = await fetch(`${base}/api/v1/builds/${acknowledged[0].slug}`, { headers: { cookie } });
    expect(res.status).toBe(200);
  }, 180_000);
});

async function query<T>(text: string, values: unknown[] = []): Promise<T[]> {
  const client = new pg.Client({ connectionString: server.url(DATABASE) });
  await client.connect();
  try { return (await client.query(text, values)).rows as T[]; } finally { await client.end(); }
}

async function until(what: string, check: () => Promise<boolean>, timeoutMs: number) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`timed out waiting for ${what}`);
}

describe("durable side effects", () => {
  it("keeps a message while the mail server is down and delivers it when it is back", async () => {
    await stopMail();
    const email = "moderator@trainyard.test";
    const res = await fetch(`${base}/api/auth/request-password-reset`, {
      method: "POST", headers: { "content-type": "application/json", origin: base }, body: JSON.stringify({ email, redirectTo: "/reset-password" }),
    });
    expect(res.status).toBe(200);
    const adminCookie = await signIn("admin@trainyard.test"); // only an admin may read the outbox
    const outbox = async () => (await (await fetch(`${base}/api/dev/outbox?to=moderator`, { headers: { cookie: adminCookie } })).json()) as { messages: { subject: string }[]; pending: { subject: string; state: string; retryCount: number }[] };
    // The worker tries, fails (nothing listens), and keeps the job for a retry.
    await until("a failed delivery attempt", async () => (await outbox()).pending.some((p) => p.retryCount > 0), 20_000);
    expect((await outbox()).messages.some((m) => /reset/i.test(m.subject))).toBe(false);
    const mail = await startMailFake({ port: mailPort, databaseUrl: server.url(DATABASE) });
    stopMail = mail.stop;
    await until("the retried delivery", async () => (await outbox()).messages.some((m) => /reset/i.test(m.subject)), 60_000);
    expect((await outbox()).pending).toEqual([]);
  }, 120_000);

  it("finishes a catalog re-check that a crash interrupted", async () => {
    const [{ slug }] = await query<{ slug: string }>("select unnest(part_ids) as slug from builds where title like $1 limit 1", [`${TITLE}%`]);
    const users = await query<{ count: string }>("select count(*) from builds where $1 = any(part_ids)", [slug]);
    const using = Number(users[0].count);
    expect(using).toBeGreaterThan(5);
    const mod = await fetch(`${base}/api/auth/sign-in/email`, {
      method: "POST", headers: { "content-type": "application/json", origin: base },
      body: JSON.stringify({ email: "moderator@trainyard.test", password: process.env.DEMO_PASSWORD ?? "trainyard-demo" }),
    });
    const modCookie = mod.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
    const [{ now }] = await query<{ now: Date }>("select now()");
    const patch = await fetch(`${base}/api/v1/parts/${slug}`, {
      method: "PATCH", headers: { "content-type": "application/json", origin: base, cookie: modCookie }, body: JSON.stringify({ description: `Re-measured ${Date.now()}` }),
    });
    expect(patch.status).toBe(200);
    expect((await patch.json()).recheck.queued).toBe(using);
    await killApp("SIGKILL");
    const checked = async () => Number((await query<{ count: string }>("select count(*) from builds where $1 = any(part_ids) and checked_at > $2", [slug, now]))[0].count);
    expect(await checked(), "the crash interrupted the re-check").toBeLessThan(using);
    await startApp();
    await until("every build re-checked after the restart", async () => (await checked()) === using, 120_000);
  }, 200_000);
});
