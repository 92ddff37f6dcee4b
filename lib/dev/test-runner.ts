// npm test — unit tests first (no services), then a fresh database, the fakes, a production
// build of the app, and the integration and browser tests against it.
import { spawn, spawnSync } from "node:child_process";
import { existsSync, mkdirSync, readFileSync, rmSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { dropDatabase } from "@/db/server";
import { seedDemo } from "@/seed/index";
import { ensureChromium } from "./chromium";
import { buildApp, serveApp, waitForHealth } from "./next-process";
import { freePort, startServices } from "./services";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..", "..");
const reports = path.join(root, ".data", "test-reports");
rmSync(reports, { recursive: true, force: true });
mkdirSync(reports, { recursive: true });

type Totals = { passed: number; failed: number; skipped: number };
const totals: Totals = { passed: 0, failed: 0, skipped: 0 };

// Asynchronous on purpose: the mail and S3 fakes live in this process and must keep answering.
async function vitest(projects: string[], env: NodeJS.ProcessEnv, extra: string[] = []): Promise<number> {
  const out = path.join(reports, `${projects.join("-")}.json`);
  const args = [path.join(root, "node_modules", "vitest", "vitest.mjs"), "run", ...projects.flatMap((p) => ["--project", p]),
    "--reporter=default", "--reporter=json", `--outputFile.json=${out}`, ...extra];
  const child = spawn(process.execPath, args, { cwd: root, stdio: "inherit", env });
  const code = await new Promise<number>((resolve) => child.on("exit", (c) => resolve(c ?? 1)));
  if (existsSync(out)) {
    const report = JSON.parse(readFileSync(out, "utf8")) as { numPassedTests: number; numFailedTests: number; numPendingTests: number; numTodoTests: number };
    totals.passed += report.numPassedTests;
    totals.failed += report.numFailedTests;
    totals.skipped += report.numPendingTests + report.numTodoTests;
  } else if (code !== 0) {
    totals.failed += 1;
  }
  return code;
}

const args = process.argv.slice(2);
console.log("[lint] biome lint --error-on-warnings");
const lint = spawnSync(path.join(root, "node_modules", ".bin", "biome"), ["lint", "--error-on-warnings", "."], { cwd: root, stdio: "inherit" });
if (lint.status !== 0) totals.failed += 1;
console.log("[typecheck] tsc --noEmit");
const tsc = spawnSync(process.execPath, [path.join(root, "node_modules", "typescript", "bin", "tsc"), "--noEmit", "-p", "tsconfig.json"], { cwd: root, stdio: "inherit" });
if (tsc.status !== 0) totals.failed += 1;
let status = (lint.status ?? 1) || (tsc.status ?? 1);
status = (await vitest(["unit"], process.env, args)) || status;

if (!process.env.TRAINYARD_UNIT_ONLY) {
  const haveChromium = ensureChromium();
  const appPort = await freePort();
  const database = `trainyard_test_${process.pid}`;
  const services = await startServices({ root, appPort, database, fresh: true, throwawayDatabase: true, secret: crypto.randomUUID() + crypto.randomUUID() });
  let app: ReturnType<typeof serveApp> | undefined;
  try {
    await seedDemo(services.databaseUrl);
    // Limits off for the general suite (tests/integration/limits.test.ts starts its own
    // instances with them on); a large upload quota so that no suite trips over it.
    // Two server processes (lib/dev/serve.ts), as `npm start` runs on a 2-CPU machine, so that
    // the suite's requests are spread over both and the instances the fault and limit tests
    // start are clusters too; TRAINYARD_WORKERS=1 tests a single process.
    const env = { ...process.env, ...services.env, TRAINYARD_RATE_LIMIT: "0", TRAINYARD_UPLOADS_PER_DAY: "100000", TRAINYARD_TEST_RUNNER: "1",
      TRAINYARD_WORKERS: process.env.TRAINYARD_WORKERS ?? "2" };
    if (!process.env.TRAINYARD_SKIP_BUILD) buildApp(root, env);
    app = serveApp(root, { port: appPort, dev: false, env, quiet: true });
    let appLog = "";
    app.stdout?.on("data", (d) => { appLog += d; });
    app.stderr?.on("data", (d) => { appLog += d; });
    const baseUrl = `http://127.0.0.1:${appPort}`;
    await waitForHealth(baseUrl);
    const testEnv = { ...env, TRAINYARD_BASE_URL: baseUrl, TRAINYARD_E2E: haveChromium ? "1" : "0" };
    const projects = ["integration", ...(haveChromium ? ["e2e"] : [])];
    const s = await vitest(projects, testEnv, args);
    if (s !== 0) {
      status = status || s;
      console.log(`\n── app server log (last 4000 characters) ──\n${appLog.slice(-4000)}`);
    }
  } catch (err) {
    console.error(err);
    status = 1;
    totals.failed += 1;
  } finally {
    app?.kill("SIGTERM");
    if (!process.env.DATABASE_URL) {
      try { await dropDatabase(services.databaseUrl.replace(/\/[^/]+$/, "/postgres"), database); } catch { /* best effort */ }
    }
    await services.stop();
  }
}

console.log(`\n${totals.passed} passed, ${totals.failed} failed, ${totals.skipped} skipped`);
process.exit(status);
