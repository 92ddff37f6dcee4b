// How many server processes lib/dev/serve.ts starts, and how many solve threads each one gets.
import os from "node:os";
import { describe, expect, it } from "vitest";
import { workerCount } from "@/lib/dev/worker-count";
import { solveThreads } from "@/lib/solve-pool/pool";

describe("workerCount", () => {
  it("is 1 under next dev, whatever TRAINYARD_WORKERS says", () => {
    expect(workerCount({ TRAINYARD_WORKERS: "4" }, true)).toBe(1);
  });
  it("follows TRAINYARD_WORKERS in production", () => {
    expect(workerCount({ TRAINYARD_WORKERS: "3" }, false)).toBe(3);
    expect(workerCount({ TRAINYARD_WORKERS: " 1 " }, false)).toBe(1);
  });
  it("defaults to one per CPU the machine offers, at most 4 (PostgreSQL connections)", () => {
    expect(workerCount({}, false)).toBe(Math.min(os.availableParallelism(), 4));
    expect(workerCount({ TRAINYARD_WORKERS: "" }, false, 2)).toBe(2);
    expect(workerCount({}, false, 1)).toBe(1);
    expect(workerCount({}, false, 4)).toBe(4);
    expect(workerCount({}, false, 64)).toBe(4);
    expect(workerCount({ TRAINYARD_WORKERS: "6" }, false, 64)).toBe(6);
  });
  it("refuses a value that is not a whole number of at least 1", () => {
    for (const bad of ["0", "-2", "1.5", "two"]) expect(() => workerCount({ TRAINYARD_WORKERS: bad }, false)).toThrow(/TRAINYARD_WORKERS/);
  });
});

describe("solveThreads", () => {
  it("shares the CPUs among the server processes, between 1 and 2 threads each", () => {
    expect(solveThreads(2, 1)).toBe(2);
    expect(solveThreads(2, 2)).toBe(1);
    expect(solveThreads(2, 4)).toBe(1);
    expect(solveThreads(8, 2)).toBe(2);
    expect(solveThreads(1, 1)).toBe(1);
  });
});
