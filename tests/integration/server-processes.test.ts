// lib/dev/serve.ts with several worker processes (node:cluster): a server of this file's own,
// TRAINYARD_WORKERS=2, on the suite's database. Both workers answer the same port; a worker that
// dies is replaced; SIGTERM stops them all; and a primary killed with SIGKILL leaves nothing
// behind (no worker alive, nothing listening on the port), so that a restart on the same port
// (tests/integration/faults.test.ts does one) can never meet a leftover worker.
import type { ChildProcess } from "node:child_process";
import { readdirSync, readFileSync } from "node:fs";
import net from "node:net";
import path from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { serveApp, waitForHealth } from "@/lib/dev/next-process";
import { freePort } from "@/lib/dev/services";
import { flagshipRequest } from "./builds-support";

const root = path.resolve(import.meta.dirname, "..", "..");
let running: ChildProcess | undefined;

afterEach(() => {
  if (running && running.exitCode === null && running.signalCode === null) running.kill("SIGKILL");
  running = undefined;
});

async function start(): Promise<{ child: ChildProcess; url: string; port: number; log: () => string }> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child = serveApp(root, { port, dev: false, quiet: true, env: { ...process.env, PORT: String(port), BETTER_AUTH_URL: url, TRAINYARD_WORKERS: "2", TRAINYARD_WORKER: "0" } });
  let out = "";
  child.stdout?.on("data", (d) => { out += d; });
  child.stderr?.on("data", (d) => { out += d; });
  running = child;
  await waitForHealth(url, 180_000);
  // Health answers once one worker listens; wait for the primary's line that all of them do.
  await until(() => out.includes("(2 worker processes)"), 120_000);
  return { child, url, port, log: () => out };
}

/** Process ids whose parent is `pid` (from /proc). */
function childrenOf(pid: number): number[] {
  const found: number[] = [];
  for (const entry of readdirSync("/proc")) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const stat = readFileSync(`/proc/${entry}/stat`, "utf8");
      const ppid = Number(stat.slice(stat.lastIndexOf(")") + 2).split(" ")[1]);
      if (ppid === pid) found.push(Number(entry));
    } catch { /* gone meanwhile */ }
  }
  return found;
}

/** Running (a zombie waiting for whoever adopted it to reap it runs nothing and holds no socket). */
function alive(pid: number): boolean {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
    return stat.slice(stat.lastIndexOf(")") + 2, stat.lastIndexOf(")") + 3) !== "Z";
  } catch {
    return false;
  }
}

function accepts(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect(port, "127.0.0.1");
    socket.once("connect", () => { socket.destroy(); resolve(true); });
    socket.once("error", () => resolve(false));
  });
}

async function until(check: () => boolean | Promise<boolean>, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await check())) {
    if (Date.now() > deadline) throw new Error("timed out waiting");
    await new Promise((r) => setTimeout(r, 100));
  }
}

async function solve(url: string) {
  const res = await fetch(`${url}/api/v1/solve`, { method: "POST", headers: { "content-type": "application/json", origin: url }, body: JSON.stringify(flagshipRequest) });
  return { status: res.status, body: await res.json() as { solutions?: unknown[]; error?: { code: string } } };
}

describe("the server with two worker processes", () => {
  it("runs two workers that answer the same port, with the same answer, and bad input still gets 400 with field errors", async () => {
    const { child, url } = await start();
    const workers = childrenOf(child.pid!);
    expect(workers).toHaveLength(2);
    // Many connections at once: the primary hands them to both workers in turn.
    const answers = await Promise.all(Array.from({ length: 8 }, () => solve(url)));
    for (const a of answers) expect(a.status).toBe(200);
    const first = JSON.stringify(answers[0].body);
    expect(first).toContain("solutions");
    for (const a of answers) expect(JSON.stringify(a.body)).toBe(first);
    const bad = await fetch(`${url}/api/v1/solve`, { method: "POST", headers: { "content-type": "application/json", origin: url }, body: JSON.stringify({ optics: { partId: "" }, camera: 7 }) });
    expect(bad.status).toBe(400);
    const err = await bad.json() as { error: { code: string; fields?: Record<string, string[]> } };
    expect(err.error.code).toBe("bad_request:validation");
    expect(Object.keys(err.error.fields ?? {}).some((k) => k.startsWith("camera"))).toBe(true);
  }, 300_000);

  it("replaces a worker that dies, and keeps answering", async () => {
    const { child, url, log } = await start();
    const [victim, other] = childrenOf(child.pid!);
    process.kill(victim, "SIGKILL");
    await until(() => log().includes("starting another"), 30_000);
    await until(() => { const now = childrenOf(child.pid!); return now.length === 2 && !now.includes(victim); }, 120_000);
    expect(childrenOf(child.pid!)).toContain(other);
    await waitForHealth(url, 60_000);
    expect((await solve(url)).status).toBe(200);
  }, 300_000);

  it("stops every worker on SIGTERM and exits 0", async () => {
    const { child, port } = await start();
    const workers = childrenOf(child.pid!);
    const exited = new Promise<number | null>((r) => child.once("exit", (code) => r(code)));
    child.kill("SIGTERM");
    expect(await exited).toBe(0);
    for (const w of workers) expect(alive(w)).toBe(false);
    expect(await accepts(port)).toBe(false);
  }, 300_000);

  it("leaves no worker and nothing listening on the port when the primary is killed with SIGKILL", async () => {
    const { child, port } = await start();
    const workers = childrenOf(child.pid!);
    expect(workers).toHaveLength(2);
    const exited = new Promise((r) => child.once("exit", r));
    child.kill("SIGKILL");
    await exited;
    // The workers notice their primary is gone and exit on their own (nobody else signals them).
    await until(() => workers.every((w) => !alive(w)), 15_000);
    expect(await accepts(port)).toBe(false);
  }, 300_000);
});
