// solveTrain — plan an imaging train that mates joint by joint and lands on back focus.
// Pure: no database, no framework, no I/O. Contract: SOLVER.md (v2).

import { materialize } from "./chain";
import { findNearest } from "./nearest";
import { connectable, prepare, type Problem } from "./problem";
import { noConnectionReason, outOfReachReason, tooLongReason } from "./reasons";
import { searchSolutions } from "./search";
import { findShortest } from "./shortest";
import { buildTables } from "./tables";
import type { SolveRequest, SolveResult } from "./types";

export * from "./types";
export { countDetours } from "./detours";

/** The SOLVER.md contract this solver implements. */
export const contractVersion = 2;
export { getModel as warmCatalog } from "./model";

export function solveTrain(request: SolveRequest): SolveResult {
  const p = prepare(request);
  const result = solve(p);
  if (p.work.exhausted) {
    result.truncated = true;
    if (result.reason) result.reason = `The search stopped early (too many combinations to try them all), so this may be wrong: ${result.reason}`;
  }
  return result;
}

function solve(p: Problem): SolveResult {
  const base = { targetMm: p.target, toleranceMm: p.tol, filterShiftMm: p.filterShift };
  if (!connectable(p)) {
    return { status: "no-connection", ...base, shortest: null, solutions: [], reason: noConnectionReason(p, null) };
  }
  const t = buildTables(p);
  const shortestMoves = findShortest(p, t);
  if (!shortestMoves) {
    return { status: "no-connection", ...base, shortest: null, solutions: [], reason: noConnectionReason(p, t) };
  }
  const shortest = materialize(p, shortestMoves, "min");
  if (p.target !== null && shortest.sensorDistanceMm > p.hi) {
    return {
      status: "too-long", ...base, shortest, solutions: [],
      reason: tooLongReason(p, shortest),
      nearest: { belowMm: null, aboveMm: shortest.sensorDistanceMm },
    };
  }
  const solutions = searchSolutions(p, t);
  if (solutions.length === 0 && p.target !== null) {
    const nearest = findNearest(p, t);
    return { status: "out-of-reach", ...base, shortest, solutions, reason: outOfReachReason(p, nearest), nearest };
  }
  return { status: "ok", ...base, shortest, solutions };
}
