// npm start / npm run dev — PostgreSQL, mail and S3 fakes, migrations, demo seed, then Next.js.
import path from "node:path";
import { fileURLToPath } from "node:url";
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from "@/seed/accounts";
import { seedDemoBuilds } from "@/seed/demo-builds";
import { seedDemo } from "@/seed/index";
import { buildApp, buildIsStale, buildWorker, serveApp, waitForHealth } from "./next-process";
import { startServices } from "./services";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..", "..");
const dev = process.argv.includes("--dev");
const port = Number(process.env.PORT ?? 3000);

const services = await startServices({ root, appPort: port, database: process.env.PGDATABASE ?? "trainyard" });
let stopping = false;
async function shutdown(code = 0) {
  if (stopping) return;
  stopping = true;
  child?.kill("SIGTERM");
  await services.stop();
  process.exit(code);
}
process.on("SIGINT", () => void shutdown(0));
process.on("SIGTERM", () => void shutdown(0));

let child: ReturnType<typeof serveApp> | undefined;
try {
  await seedDemo(services.databaseUrl);
  const env = { ...process.env, ...services.env };
  if (!dev && buildIsStale(root)) {
    console.log("[next] building the app (first start or sources changed)…");
    buildApp(root, env);
  }
  if (dev) buildWorker(root, env);
  child = serveApp(root, { port, dev, env });
  child.on("exit", (code) => void shutdown(code ?? 0));
  await waitForHealth(`http://127.0.0.1:${port}`, dev ? 300_000 : 120_000);
  await seedDemoBuilds(`http://127.0.0.1:${port}`).catch((err) => console.error(`[seed] demo builds skipped: ${(err as Error).message}`));
  console.log(`\nTrainyard: http://127.0.0.1:${port}  (demo password: ${DEMO_PASSWORD})`);
  console.log(`Demo accounts: ${DEMO_ACCOUNTS.map((a) => a.email).join(", ")}\n`);
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  await shutdown(1);
}
