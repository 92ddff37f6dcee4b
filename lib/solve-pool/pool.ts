import "server-only";
// Heavy solves run in a small pool of worker threads (piscina) with a time budget, so one
// client's huge inline request cannot stall every other request on the main thread.
import os from "node:os";
import path from "node:path";
import { Piscina } from "piscina";
import { AppError } from "@/lib/errors";
import type { SolveRequest, SolveResult } from "@/lib/solver";

/**
 * A solve not answered this long after it was queued is stopped (its worker thread is ended).
 * A capped worst case (2,000 parts, 8 stations, maxParts 12) takes about 0.5 s on a warm
 * worker here; the rest is room for the queue and a loaded machine.
 */
export const SOLVE_BUDGET_MS = 5_000;
/** Beyond this many waiting solves, new ones are turned away (503) rather than queued. */
const MAX_QUEUE = 4;

/**
 * Threads per process: the CPUs shared among the server processes (lib/dev/serve.ts runs
 * TRAINYARD_SERVER_PROCESSES of them), at most 2, at least 1, so that N processes never start more
 * solve threads than the machine has CPUs (beyond the one a single process always gets).
 */
export function solveThreads(cpus = os.availableParallelism(), processes = Number(process.env.TRAINYARD_SERVER_PROCESSES) || 1): number {
  return Math.max(1, Math.min(2, Math.floor(cpus / Math.max(1, processes))));
}

const globalForPool = globalThis as unknown as { trainyardSolvePool?: Piscina };

function pool(): Piscina {
  globalForPool.trainyardSolvePool ??= new Piscina({
    filename: path.join(process.cwd(), process.env.NEXT_DIST_DIR ?? ".next", "solve-worker.mjs"),
    minThreads: 1, maxThreads: solveThreads(), maxQueue: MAX_QUEUE, idleTimeout: 60_000,
  });
  return globalForPool.trainyardSolvePool;
}

export async function solveInWorker(request: SolveRequest, budgetMs = SOLVE_BUDGET_MS): Promise<SolveResult> {
  const p = pool();
  if (p.queueSize >= MAX_QUEUE) {
    const e = new AppError("unavailable:busy", "The planner is busy with other large requests. Try again in a few seconds.");
    e.headers = { "retry-after": "5" };
    throw e;
  }
  try {
    return await p.run(request, { signal: AbortSignal.timeout(budgetMs) }) as SolveResult;
  } catch (err) {
    if ((err as Error)?.name === "AbortError" || (err as Error)?.name === "TimeoutError") {
      throw new AppError("bad_request:too_complex", `This plan needs more than ${budgetMs / 1000} s of work: send fewer parts or a lower maxParts.`);
    }
    throw err;
  }
}
