// The HTTP server in front of Next.js (npm start, npm run dev, the test runner). It exists for
// one reason: Next passes a client's own X-Forwarded-For through to the app, so limits keyed
// on it could be dodged with a made-up header. Here the socket's peer address decides, and
// forwarded headers count only from proxies listed in TRAINYARD_TRUSTED_PROXIES.
//   usage: node --import tsx lib/dev/serve.ts [--dev] -H 127.0.0.1 -p 3000
import http from "node:http";
import next from "next";
import { parseTrustedProxies, sanitizeForwardedHeaders } from "@/lib/http/forwarded";

const argv = process.argv.slice(2);
const arg = (flag: string, fallback: string) => { const i = argv.indexOf(flag); return i >= 0 ? argv[i + 1] : fallback; };
const dev = argv.includes("--dev");
const hostname = arg("-H", "127.0.0.1");
const port = Number(arg("-p", process.env.PORT ?? "3000"));
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
server.listen(port, hostname, () => console.log(`▲ Trainyard on http://${hostname}:${port}${dev ? " (development)" : ""}${trusted ? " · trusting forwarded headers from configured proxies" : ""}`));
const stop = () => server.close(() => process.exit(0));
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
