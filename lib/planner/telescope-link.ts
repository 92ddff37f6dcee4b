// Telescope → corrector: any mating chain will do (no back focus on this side). One place
// for the shapes and limits, used by the plan, the corrector picker and "what to change".
import { rowToSolverPart } from "@/lib/catalog/to-solver";
import type { PartRowLike } from "@/lib/catalog/rows";
import { solveTrain, type Camera, type Optics, type Part, type SolveResult } from "@/lib/solver";

/** Most adapters between a telescope and its corrector. */
export const LINK_MAX_PARTS = 6;

export function linkEnds(telescope: PartRowLike, corrector: PartRowLike): { scope: Optics; end: Camera } {
  return {
    scope: { ...rowToSolverPart(telescope), lengthMm: 0 },
    end: { ...rowToSolverPart(corrector), id: corrector.slug, rear: null, lengthMm: 0 },
  };
}

export function solveLink(telescope: PartRowLike, corrector: PartRowLike, parts: Part[], maxSolutions = 1): SolveResult {
  const { scope, end } = linkEnds(telescope, corrector);
  return solveTrain({ optics: scope, camera: end, parts, maxSolutions, maxParts: LINK_MAX_PARTS });
}
