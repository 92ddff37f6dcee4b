// Issue 16 item 4 and issue 13 item 4: rate limits that a made-up X-Forwarded-For cannot
// dodge and that two app instances share, because they are counted in PostgreSQL. The
// general suite runs with limits off; this file starts two more instances of the same build,
// on the same database, with limits on.
import type { ChildProcess } from "node:child_process";
import path from "node:path";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { serveApp, waitForHealth } from "@/lib/dev/next-process";
import { freePort } from "@/lib/dev/services";
import { signedIn } from "../support/http";

const root = path.resolve(import.meta.dirname, "..", "..");
const PDF = new TextEncoder().encode("%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n");
const SOLVE_LIMIT = 10;

type Instance = { url: string; child: ChildProcess };
let a: Instance, b: Instance;
let uploadQuota = 0;

async function countMemberSubmissionsToday(): Promise<number> {
  const member = await signedIn("member@trainyard.test");
  let n = 0, cursor: string | null = null;
  const since = Date.now() - 24 * 3600_000;
  do {
    const page = await (await member.get(`/api/v1/submissions?limit=100${cursor ? `&cursor=${cursor}` : ""}`)).json() as { items: { createdAt: string }[]; nextCursor: string | null };
    n += page.items.filter((i) => Date.parse(i.createdAt) >= since).length;
    cursor = page.nextCursor;
  } while (cursor);
  return n;
}

async function start(env: Record<string, string>): Promise<Instance> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child = serveApp(root, { port, dev: false, quiet: true, env: { ...process.env, PORT: String(port), BETTER_AUTH_URL: url, TRAINYARD_RATE_LIMIT: "1", ...env } });
  child.stdout?.resume();
  child.stderr?.resume();
  await waitForHealth(url, 120_000);
  return { url, child };
}

beforeAll(async () => {
  uploadQuota = (await countMemberSubmissionsToday()) + 2;
  const env = { TRAINYARD_LIMIT_SOLVE: String(SOLVE_LIMIT), TRAINYARD_UPLOADS_PER_DAY: String(uploadQuota) };
  [a, b] = await Promise.all([start(env), start(env)]);
}, 240_000);

afterAll(() => {
  a?.child.kill("SIGTERM");
  b?.child.kill("SIGTERM");
});

const spoofed = (i: number) => ({ "x-forwarded-for": `203.0.113.${i % 250}, 198.51.100.${i % 250}`, "x-real-ip": `192.0.2.${i % 250}` });

const tinySolve = {
  optics: { id: "o", front: null, rear: { interface: "M48x0.75", gender: "male" }, lengthMm: 0, backFocusMm: 55 },
  camera: { id: "c", front: { interface: "M48x0.75", gender: "female" }, rear: null, lengthMm: 17.5 },
  parts: [{ id: "s", front: { interface: "M48x0.75", gender: "female" }, rear: { interface: "M48x0.75", gender: "male" }, lengthMm: 37.5 }],
};

describe("limits shared by two instances, keyed on the real peer", () => {
  it("caps a member's uploads per day (issue 16 item 9)", async () => {
    // Sign in on the main app (limits off there) and carry the cookie to instance A.
    const member = await signedIn("member@trainyard.test");
    const upload = async (i: number) => {
      const form = new FormData();
      form.set("part", JSON.stringify({ kind: "spacer", maker: "Test Bench Works", model: `Quota ${Date.now()} ${i}`, front: { interface: "M48x0.75", gender: "female" }, rear: { interface: "M48x0.75", gender: "male" }, lengthMm: 2 + i }));
      form.set("specSheet", new Blob([PDF as BlobPart], { type: "application/pdf" }), "s.pdf");
      return fetch(`${a.url}/api/v1/submissions`, { method: "POST", body: form, headers: { cookie: member.cookieHeader(), origin: a.url } });
    };
    expect((await upload(1)).status).toBe(201);
    expect((await upload(2)).status).toBe(201);
    const over = await upload(3);
    expect(over.status).toBe(429);
    expect(Number(over.headers.get("retry-after"))).toBeGreaterThan(0);
    expect((await over.json()).error.code).toBe("too_many_requests:uploads");
  });

  it("stops password guessing at one shared window, whatever X-Forwarded-For says", async () => {
    const statuses: number[] = [];
    let retryAfter: string | null = null;
    for (let i = 0; i < 40; i++) {
      const target = i % 2 ? b : a;
      const res = await fetch(`${target.url}/api/auth/sign-in/email`, {
        method: "POST", headers: { "content-type": "application/json", origin: target.url, ...spoofed(i) },
        body: JSON.stringify({ email: "admin@trainyard.test", password: `guess-${i}` }),
      });
      statuses.push(res.status);
      if (res.status === 429) retryAfter ??= res.headers.get("retry-after");
    }
    const allowed = statuses.filter((s) => s !== 429).length;
    // better-auth allows 30 a minute on /sign-in/email. Two instances counting separately
    // would allow 40 of 40; a header-keyed limit would allow all of them too.
    expect(allowed).toBeLessThanOrEqual(30);
    expect(allowed).toBeGreaterThanOrEqual(25);
    expect(statuses.slice(allowed).every((s) => s === 429)).toBe(true);
    expect(statuses.slice(0, allowed).every((s) => s === 401)).toBe(true);
    expect(Number(retryAfter)).toBeGreaterThan(0);

    // The window lives in PostgreSQL (better-auth's database storage).
    const db = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await db.connect();
    try {
      const { rows } = await db.query(`SELECT key, count FROM rate_limit WHERE key LIKE '%sign-in%'`);
      expect(rows.length).toBeGreaterThan(0);
      expect(Math.max(...rows.map((r) => Number(r.count)))).toBeGreaterThanOrEqual(25);
    } finally {
      await db.end();
    }
  });

  it("limits POST /api/v1/solve per address across both instances, with Retry-After", async () => {
    const results: Response[] = [];
    for (let i = 0; i < SOLVE_LIMIT + 4; i++) {
      const target = i % 2 ? b : a;
      results.push(await fetch(`${target.url}/api/v1/solve`, { method: "POST", headers: { "content-type": "application/json", origin: target.url, ...spoofed(i) }, body: JSON.stringify(tinySolve) }));
    }
    const statuses = results.map((r) => r.status);
    expect(statuses.slice(0, SOLVE_LIMIT)).toEqual(Array(SOLVE_LIMIT).fill(200));
    expect(statuses.slice(SOLVE_LIMIT)).toEqual(Array(4).fill(429));
    const limited = results[SOLVE_LIMIT];
    expect(Number(limited.headers.get("retry-after"))).toBeGreaterThan(0);
    expect((await limited.json()).error.code).toBe("too_many_requests");
  });
});
