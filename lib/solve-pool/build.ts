// Bundles the solve worker next to the Next.js build (<distDir>/solve-worker.mjs).
import { build } from "esbuild";
import path from "node:path";

export function workerFile(root: string): string {
  return path.join(root, process.env.NEXT_DIST_DIR ?? ".next", "solve-worker.mjs");
}

export async function buildSolveWorker(root: string): Promise<void> {
  await build({
    entryPoints: [path.join(root, "lib", "solve-pool", "worker.ts")],
    outfile: workerFile(root),
    bundle: true, platform: "node", format: "esm", target: "node20", logLevel: "warning",
    tsconfig: path.join(root, "tsconfig.json"),
    // graphology is CommonJS: let esbuild's require shim find Node's built-ins.
    banner: { js: "import { createRequire } from 'node:module'; const require = createRequire(import.meta.url);" },
  });
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(new URL(import.meta.url).pathname)) {
  await buildSolveWorker(process.cwd());
  console.log(`[solve-worker] ${path.relative(process.cwd(), workerFile(process.cwd()))}`);
}
