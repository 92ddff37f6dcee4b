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

/**
 * The plan's front link, with a separate corrector only: telescope → corrector from the plan's
 * own parts, and — when those do not join them — whether the catalog would (said in the
 * reason). The ends come back named, for joinPlan.
 */
export function planTelescopeLink({ telescopeRow, correctorRow, parts, catalogConnectors }: {
  telescopeRow: PartRowLike | null; correctorRow: PartRowLike | null; parts: Part[]; catalogConnectors: Part[];
}): { link: SolveResult | null; catalogLink: SolveResult | null; telescope: (Part & { name: string }) | null; corrector: (Part & { name: string }) | null } {
  if (!telescopeRow || !correctorRow) return { link: null, catalogLink: null, telescope: null, corrector: null };
  const { scope, end } = linkEnds(telescopeRow, correctorRow);
  const solve = (from: Part[]) => solveLink(telescopeRow, correctorRow, from, 3);
  const link = solve(parts);
  const catalogLink = link.status === "ok" ? null : parts === catalogConnectors ? link : solve(catalogConnectors);
  return {
    link, catalogLink,
    telescope: { ...scope, name: `${telescopeRow.maker} ${telescopeRow.model}` },
    corrector: { ...end, name: `${correctorRow.maker} ${correctorRow.model}` },
  };
}
