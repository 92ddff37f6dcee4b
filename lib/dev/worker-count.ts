// How many server processes lib/dev/serve.ts runs (kept apart so that tests can read the rule).
import os from "node:os";

/** 1 under `next dev`; else TRAINYARD_WORKERS (a whole number ≥ 1); else one per CPU. */
export function workerCount(env: Record<string, string | undefined>, dev: boolean): number {
  if (dev) return 1;
  const raw = env.TRAINYARD_WORKERS?.trim();
  if (!raw) return os.availableParallelism();
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 1) throw new Error(`TRAINYARD_WORKERS must be a whole number of at least 1 (got "${raw}").`);
  return n;
}
