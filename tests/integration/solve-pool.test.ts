// Issue 16 item 3: the worker pool (from the production build's bundled worker) answers like
// the solver does in-process, and stops a solve that overruns its time budget.
import { afterAll, describe, expect, it } from "vitest";
import { solveInWorker } from "@/lib/solve-pool/pool";
import { solveTrain } from "@/lib/solver";
import { makeCatalog, makeRequests } from "../bench/catalog";

const [request] = makeRequests(makeCatalog(2_000, "uniform"), 1);

afterAll(async () => {
  await (globalThis as unknown as { trainyardSolvePool?: { destroy: () => Promise<void> } }).trainyardSolvePool?.destroy();
});

describe("the solve worker pool", () => {
  it("gives the same answer as the solver on this thread", async () => {
    const small = { ...request, parts: request.parts.slice(0, 300) };
    expect(await solveInWorker(small)).toEqual(solveTrain(small));
  });

  it("stops a solve past its budget with a clear 400", async () => {
    const err = await solveInWorker({ ...request, maxParts: 12, maxSolutions: 20 }, 1).then(() => null, (e: unknown) => e as { code?: string; status?: number; message?: string });
    expect(err?.code).toBe("bad_request:too_complex");
    expect(err?.status).toBe(400);
    // The pool still works after a worker was ended.
    expect((await solveInWorker({ ...request, parts: request.parts.slice(0, 50) })).status).toBeDefined();
  });
});
