// The HTTP server in front of Next.js (npm start, npm run dev, the test runner). It exists for
// two reasons:
// - Next passes a client's own X-Forwarded-For through to the app, so limits keyed on it could
//   be dodged with a made-up header. Here the socket's peer address decides, and forwarded
//   headers count only from proxies listed in TRAINYARD_TRUSTED_PROXIES.
// - One Node process serves requests on one thread. In production this process is a primary
//   that runs TRAINYARD_WORKERS copies of the server (node:cluster, default: one per CPU the
//   machine offers) on the same port; the primary accepts the connections and hands them to
//   the workers in turn. `--dev` always runs one process (next dev rebuilds and hot-reloads in
//   it). Every worker is a whole app process: it runs the job worker (instrumentation.ts), keeps
//   its own catalog and plan caches (keyed by the catalog version in PostgreSQL), and counts
//   rate limits in PostgreSQL, as separate instances behind a load balancer would.
//
// Lifecycle of a primary with workers:
// - SIGTERM / SIGINT: passed on to every worker, which stops taking connections and exits; the
//   primary exits when they have (or after 10 s, killing the ones left).
// - The primary dies, even by SIGKILL: its workers lose their IPC channel and exit at once
//   (node:cluster ends a worker whose primary went away), and the listening socket belonged to
//   the primary, so nothing is left answering on the port.
// - A worker that exits cleanly (it was sent SIGTERM/SIGINT itself) stops the whole server too.
// - A worker that exits before it ever listened (a taken port, a missing build) ends the whole
//   server with an error: restarting it would only fail again. A worker that dies later (a crash,
//   out of memory) is replaced, up to 5 times a minute; past that the server gives up and exits.
//   usage: node --import tsx lib/dev/serve.ts [--dev] -H 127.0.0.1 -p 3000
import cluster, { type Worker } from "node:cluster";
import http from "node:http";
import { parseTrustedProxies, sanitizeForwardedHeaders } from "@/lib/http/forwarded";
import { workerCount } from "./worker-count";

const argv = process.argv.slice(2);
const arg = (flag: string, fallback: string) => { const i = argv.indexOf(flag); return i >= 0 ? argv[i + 1] : fallback; };
const dev = argv.includes("--dev");
const hostname = arg("-H", "127.0.0.1");
const port = Number(arg("-p", process.env.PORT ?? "3000"));

const workers = workerCount(process.env, dev);
if (cluster.isPrimary && workers > 1) runPrimary(workers);
else await serve();

async function serve() {
  const { default: next } = await import("next");
  const trusted = parseTrustedProxies(process.env.TRAINYARD_TRUSTED_PROXIES);
  const app = next({ dev, hostname, port, dir: process.cwd() });
  await app.prepare();
  const handle = app.getRequestHandler();
  const server = http.createServer((req, res) => {
    sanitizeForwardedHeaders(req.headers, req.socket.remoteAddress ?? "", trusted);
    void handle(req, res);
  });
  if (dev) {
    const upgrade = app.getUpgradeHandler();
    server.on("upgrade", (req, socket, head) => void upgrade(req, socket, head));
  }
  // A taken port must end this process (Next's own handlers would otherwise keep it alive, and
  // the start script would find whatever else answers on that port healthy).
  server.on("error", (err) => { console.error(`Cannot listen on ${hostname}:${port}: ${err.message}`); process.exit(1); });
  server.listen(port, hostname, () => {
    if (cluster.isWorker) return; // the primary says it once for all of them
    console.log(`▲ Trainyard on http://${hostname}:${port}${dev ? " (development)" : ""}${trusted ? " · trusting forwarded headers from configured proxies" : ""}`);
  });
  const stop = () => server.close(() => process.exit(0));
  process.on("SIGTERM", stop);
  process.on("SIGINT", stop);
}

function runPrimary(count: number) {
  // Workers learn how many they are (lib/solve-pool sizes its threads by it).
  const env = { TRAINYARD_SERVER_PROCESSES: String(count) };
  const listening = new Set<Worker>();
  const restarts: number[] = [];
  let stopping = false;
  let announced = false;

  const fork = () => {
    const w = cluster.fork(env);
    w.once("listening", () => {
      listening.add(w);
      if (!announced && listening.size === count) {
        announced = true;
        const trusted = parseTrustedProxies(process.env.TRAINYARD_TRUSTED_PROXIES);
        console.log(`▲ Trainyard on http://${hostname}:${port} (${count} worker processes)${trusted ? " · trusting forwarded headers from configured proxies" : ""}`);
      }
    });
    return w;
  };

  const stopAll = (code: number) => {
    if (stopping) return;
    stopping = true;
    process.exitCode = code;
    const alive = Object.values(cluster.workers ?? {}).filter((w): w is Worker => !!w && !w.isDead());
    if (!alive.length) process.exit(code);
    for (const w of alive) w.process.kill("SIGTERM");
    setTimeout(() => {
      for (const w of Object.values(cluster.workers ?? {})) if (w && !w.isDead()) w.process.kill("SIGKILL");
      process.exit(code);
    }, 10_000).unref();
  };

  cluster.on("exit", (w, code, signal) => {
    const wasListening = listening.delete(w);
    if (stopping) {
      if (!Object.values(cluster.workers ?? {}).some((o) => o && !o.isDead())) process.exit(process.exitCode ?? 0);
      return;
    }
    const how = signal ? `signal ${signal}` : `code ${code}`;
    // A clean exit means the worker was told to stop (a terminal's Ctrl-C reaches every
    // process of the group, the primary's own SIGINT may come second): stop them all.
    if (code === 0 && !signal) return stopAll(0);
    if (!wasListening) {
      console.error(`A server worker exited (${how}) before it listened on ${hostname}:${port}: stopping.`);
      return stopAll(1);
    }
    const now = Date.now();
    restarts.push(now);
    while (restarts.length && restarts[0] < now - 60_000) restarts.shift();
    if (restarts.length > 5) {
      console.error(`Server workers keep dying (${restarts.length} in a minute, the last with ${how}): stopping.`);
      return stopAll(1);
    }
    console.error(`A server worker died (${how}); starting another.`);
    fork();
  });

  process.on("SIGTERM", () => stopAll(0));
  process.on("SIGINT", () => stopAll(0));
  for (let i = 0; i < count; i++) fork();
}
