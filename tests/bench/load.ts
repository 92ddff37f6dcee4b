// npm run bench:load — autocannon against the production build: 50 connections × 30 s on each of
// POST /api/v1/solve (the flagship body), GET /api/v1/parts?limit=50, a public /b/<slug> and /plan.
// Prints requests/s, p50/p95/p99 latency and errors per target.
//
// By default it starts its own database, fakes and production server (lib/dev/serve.ts, building
// when sources changed; TRAINYARD_WORKERS processes, by default one per CPU up to 4, as `npm start`) with
// rate limits off (TRAINYARD_RATE_LIMIT=0): this measures capacity, not the limiter.
// TRAINYARD_BASE_URL=http://127.0.0.1:3000 measures an app you already run instead.
// LOAD_CONNECTIONS, LOAD_SECONDS change the load; `--only solve` runs one target.
import autocannon from "autocannon";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { dropDatabase } from "@/db/server";
import { buildApp, buildIsStale, serveApp, waitForHealth } from "@/lib/dev/next-process";
import { freePort, startServices } from "@/lib/dev/services";
import { workerCount } from "@/lib/dev/worker-count";
import { seedDemoBuilds } from "@/seed/demo-builds";
import { seedDemo } from "@/seed/index";
import { DEMO_CASES } from "@/seed/catalog/index";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..", "..");
const CONNECTIONS = Number(process.env.LOAD_CONNECTIONS ?? 50);
const SECONDS = Number(process.env.LOAD_SECONDS ?? 30);
const only = process.argv.includes("--only") ? process.argv[process.argv.indexOf("--only") + 1] : null;

const f = DEMO_CASES.flagship;
const flagship = JSON.stringify({
  optics: { partId: f.telescope }, corrector: { partId: f.optics }, camera: { partId: f.camera },
  stations: f.stations.map((partId) => ({ partId })), filters: [{ thicknessMm: f.filterThicknessMm }], source: { kind: "catalog" },
});

type Row = { name: string; rps: number; p50: number; p95: number; p99: number; requests: number; errors: number; non2xx: number };

function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

async function run(name: string, opts: autocannon.Options): Promise<Row> {
  const times: number[] = [];
  // The tracker is both an event emitter and a promise of the summary.
  const instance = autocannon({ connections: CONNECTIONS, duration: SECONDS, ...opts }) as unknown as PromiseLike<autocannon.Result> & import("node:events").EventEmitter;
  // autocannon's summary has p97.5 but no p95: keep every response time and rank them.
  instance.on("response", (_client: unknown, _status: number, _bytes: number, ms: number) => { times.push(ms); });
  const result = await instance;
  times.sort((a, b) => a - b);
  return {
    name, rps: result.requests.average, p50: percentile(times, 50), p95: percentile(times, 95), p99: percentile(times, 99),
    requests: result.requests.total, errors: result.errors + result.timeouts, non2xx: result.non2xx,
  };
}

async function main() {
  let base = process.env.TRAINYARD_BASE_URL ?? "";
  let stop = async () => {};
  if (!base) {
    const port = await freePort();
    const database = `trainyard_load_${process.pid}`;
    const services = await startServices({ root, appPort: port, database, fresh: true, secret: crypto.randomUUID() + crypto.randomUUID(), log: () => {} });
    await seedDemo(services.databaseUrl, () => {});
    const env = { ...process.env, ...services.env, TRAINYARD_RATE_LIMIT: "0" };
    if (buildIsStale(root)) buildApp(root, env);
    const app = serveApp(root, { port, dev: false, env, quiet: true });
    base = `http://127.0.0.1:${port}`;
    await waitForHealth(base);
    await seedDemoBuilds(base);
    stop = async () => {
      app.kill("SIGTERM");
      await dropDatabase(services.databaseUrl.replace(/\/[^/]+$/, "/postgres"), database).catch(() => {});
      await services.stop();
    };
  }
  const loadBefore = os.loadavg()[0];
  try {
    const list = (await (await fetch(`${base}/api/v1/builds?reference=1&limit=1`)).json()) as { items: { slug: string }[] };
    const slug = list.items[0]?.slug;
    if (!slug) throw new Error("no public build to load (is the demo seed there?)");
    const targets: [string, autocannon.Options][] = [
      ["solve", { url: `${base}/api/v1/solve`, method: "POST", headers: { "content-type": "application/json", origin: base }, body: flagship }],
      ["parts", { url: `${base}/api/v1/parts?limit=50` }],
      ["build page", { url: `${base}/b/${slug}` }],
      ["plan page", { url: `${base}/plan` }],
    ];
    const rows: Row[] = [];
    for (const [name, opts] of targets) {
      if (only && !name.startsWith(only)) continue;
      // A short warm-up so caches and JIT are in their steady state, as in production.
      await run(name, { ...opts, connections: 4, duration: 2 });
      console.error(`[load] ${name}: ${CONNECTIONS} connections × ${SECONDS} s…`);
      rows.push(await run(name, opts));
    }
    const ms = (v: number) => `${v.toFixed(0)} ms`;
    const servers = process.env.TRAINYARD_BASE_URL ? "" : `, ${workerCount(process.env, false)} server worker process(es) (TRAINYARD_WORKERS)`;
    console.log(`\n${CONNECTIONS} connections × ${SECONDS} s per target, rate limits off (TRAINYARD_RATE_LIMIT=0)${servers}, ${base}; 1-minute load average ${loadBefore.toFixed(2)} before the runs, ${os.loadavg()[0].toFixed(2)} after\n`);
    console.log("| target | req/s | p50 | p95 | p99 | requests | errors | non-2xx |");
    console.log("|---|---:|---:|---:|---:|---:|---:|---:|");
    for (const r of rows) console.log(`| ${r.name} | ${r.rps.toFixed(0)} | ${ms(r.p50)} | ${ms(r.p95)} | ${ms(r.p99)} | ${r.requests} | ${r.errors} | ${r.non2xx} |`);
  } finally {
    await stop();
  }
}

await main();
process.exit(0);
