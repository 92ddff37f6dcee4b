// Building and serving the Next.js app as a child process.
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { existsSync, readdirSync, statSync } from "node:fs";
import path from "node:path";

const SOURCES = ["app", "components", "lib", "db", "proxy.ts", "next.config.ts", "postcss.config.mjs", "package-lock.json", "tsconfig.json"];

function newestMtime(p: string): number {
  if (!existsSync(p)) return 0;
  const st = statSync(p);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const entry of readdirSync(p)) newest = Math.max(newest, newestMtime(path.join(p, entry)));
  return newest;
}

export function buildIsStale(root: string): boolean {
  const buildId = path.join(root, process.env.NEXT_DIST_DIR ?? ".next", "BUILD_ID");
  if (!existsSync(buildId)) return true;
  if (!existsSync(path.join(path.dirname(buildId), "solve-worker.mjs"))) return true;
  const built = statSync(buildId).mtimeMs;
  return SOURCES.some((s) => newestMtime(path.join(root, s)) > built);
}

const nextBin = (root: string) => path.join(root, "node_modules", "next", "dist", "bin", "next");

export function buildApp(root: string, env: NodeJS.ProcessEnv) {
  const r = spawnSync(process.execPath, [nextBin(root), "build"], { cwd: root, stdio: "inherit", env: { ...env, NEXT_TELEMETRY_DISABLED: "1" } });
  if (r.status !== 0) throw new Error("next build failed");
  buildWorker(root, env);
}

/** The solve worker (lib/solve-pool) is bundled beside the build; `npm run dev` needs it too. */
export function buildWorker(root: string, env: NodeJS.ProcessEnv) {
  const r = spawnSync(process.execPath, ["--import", "tsx", path.join(root, "lib", "solve-pool", "build.ts")], { cwd: root, stdio: "inherit", env });
  if (r.status !== 0) throw new Error("bundling the solve worker failed");
}

/** Serves through lib/dev/serve.ts (Next.js behind a server that sets the real client address). */
export function serveApp(root: string, opts: { port: number; dev: boolean; env: NodeJS.ProcessEnv; quiet?: boolean }): ChildProcess {
  const args = ["--import", "tsx", path.join(root, "lib", "dev", "serve.ts"), ...(opts.dev ? ["--dev"] : []), "-H", "127.0.0.1", "-p", String(opts.port)];
  return spawn(process.execPath, args, {
    cwd: root, stdio: opts.quiet ? ["ignore", "pipe", "pipe"] : "inherit",
    env: { ...opts.env, NEXT_TELEMETRY_DISABLED: "1", NODE_ENV: opts.dev ? "development" : "production" },
  });
}

export async function waitForHealth(baseUrl: string, timeoutMs = 120_000) {
  const deadline = Date.now() + timeoutMs;
  let last = "";
  while (Date.now() < deadline) {
    try {
      const res = await fetch(`${baseUrl}/api/health`);
      if (res.ok) return;
      last = `HTTP ${res.status}`;
    } catch (err) {
      last = (err as Error).message;
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`The app did not become healthy at ${baseUrl} (${last})`);
}
