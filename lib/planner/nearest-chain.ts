// When nothing lands in the window the solver reports the nearest reachable distances; the
// planner draws the chain that reaches the nearer one (not the bare shortest connection), so
// the diagram and the budget show what "0.10 mm short" is made of. Pure.
import { solveTrain, type Chain, type SolveRequest, type SolveResult } from "@/lib/solver";

export function nearestChain(request: SolveRequest, result: SolveResult): Chain | null {
  if (result.status !== "out-of-reach" || !result.nearest || result.targetMm === null) return null;
  const T = result.targetMm;
  const { belowMm, aboveMm } = result.nearest;
  const d = belowMm === null ? aboveMm : aboveMm === null ? belowMm : T - belowMm <= aboveMm - T ? belowMm : aboveMm;
  if (d === null || request.optics.backFocusMm === undefined) return null;
  // Aim the same request at that distance: the chain found there is real (same parts, stock
  // and stations); only its error is measured against the true target again.
  const aimed = solveTrain({
    ...request,
    optics: { ...request.optics, backFocusMm: d - result.filterShiftMm, backFocusToleranceMm: 1e-4 },
    maxSolutions: 1,
  });
  const chain = aimed.solutions[0];
  if (!chain) return null;
  return { ...chain, errorMm: chain.sensorDistanceMm - T };
}
