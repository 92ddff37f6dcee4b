// How many server processes lib/dev/serve.ts runs (kept apart so that tests can read the rule).
import os from "node:os";

/**
 * The default's ceiling. Each process may hold up to 17 PostgreSQL connections (app pool 10,
 * job queue 4, rate limiter 3): 4 processes stay within PostgreSQL's stock max_connections of
 * 100 with room for tools; the project's own cluster allows 200. More is a deliberate choice.
 */
export const DEFAULT_MAX_WORKERS = 4;

/** 1 under `next dev`; else TRAINYARD_WORKERS (a whole number ≥ 1); else one per CPU, at most DEFAULT_MAX_WORKERS. */
export function workerCount(env: Record<string, string | undefined>, dev: boolean, cpus = os.availableParallelism()): number {
  if (dev) return 1;
  const raw = env.TRAINYARD_WORKERS?.trim();
  if (!raw) return Math.min(cpus, DEFAULT_MAX_WORKERS);
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 1) throw new Error(`TRAINYARD_WORKERS must be a whole number of at least 1 (got "${raw}").`);
  return n;
}
