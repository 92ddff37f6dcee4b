// Issue 16 item 3, measured: does one client looping the heaviest allowed inline solve slow
// everyone else down? Against a running app (limits off: TRAINYARD_RATE_LIMIT=0):
//   TRAINYARD_BASE_URL=http://127.0.0.1:3000 npx tsx tests/bench/stall.bench.ts [clients=1] [seconds=10]
import { makeCatalog, makeRequests } from "./catalog";

const base = process.env.TRAINYARD_BASE_URL ?? "http://127.0.0.1:3000";
const clients = Number(process.argv[2] ?? 1);
const seconds = Number(process.argv[3] ?? 10);
const [heavy] = makeRequests(makeCatalog(2_000, "uniform"), 1);
const body = JSON.stringify({ ...heavy, maxParts: 12, maxSolutions: 20 });

const pct = (xs: number[], p: number) => { const s = [...xs].sort((a, b) => a - b); return s[Math.min(s.length - 1, Math.floor(p * s.length))] ?? NaN; };

async function probe(path: string, ms: number): Promise<number[]> {
  const out: number[] = [];
  const end = Date.now() + ms;
  while (Date.now() < end) {
    const t = performance.now();
    await (await fetch(`${base}${path}`)).arrayBuffer();
    out.push(performance.now() - t);
    await new Promise((r) => setTimeout(r, 50));
  }
  return out;
}

async function loop(until: number, counts: Record<number, number>) {
  while (Date.now() < until) {
    const r = await fetch(`${base}/api/v1/solve`, { method: "POST", headers: { "content-type": "application/json" }, body });
    await r.arrayBuffer();
    counts[r.status] = (counts[r.status] ?? 0) + 1;
  }
}

const report = (label: string, parts: number[], health: number[]) =>
  console.log(`${label.padEnd(28)} parts p50 ${pct(parts, 0.5).toFixed(0)} ms, p95 ${pct(parts, 0.95).toFixed(0)} ms · health p50 ${pct(health, 0.5).toFixed(0)} ms, p95 ${pct(health, 0.95).toFixed(0)} ms`);

const idle = await Promise.all([probe("/api/v1/parts?limit=50", seconds * 1000), probe("/api/health", seconds * 1000)]);
report("idle", ...idle);
const counts: Record<number, number> = {};
const until = Date.now() + seconds * 1000;
const [busyParts, busyHealth] = await Promise.all([probe("/api/v1/parts?limit=50", seconds * 1000), probe("/api/health", seconds * 1000), ...Array.from({ length: clients }, () => loop(until, counts))]);
report(`${clients} client(s) looping solves`, busyParts, busyHealth);
console.log(`heavy solves answered: ${JSON.stringify(counts)} (body ${(body.length / 1e3).toFixed(0)} kB, 2,000 parts, maxParts 12, maxSolutions 20)`);
