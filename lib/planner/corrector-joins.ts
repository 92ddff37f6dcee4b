import "server-only";
// Which correctors a telescope can carry: directly, or through catalog adapters. The corrector
// picker marks those and lists them first, so a new user is not offered a reducer whose
// thread the focuser does not have.
import { getPartOrThrow } from "@/db/queries/parts";
import { rowToSolverPart } from "@/lib/catalog/to-solver";
import { AppError } from "@/lib/errors";
import { solveTrain } from "@/lib/solver";
import { catalogConnectors } from "./run-plan";

export type CorrectorJoin = { slug: string; joins: boolean; adapters: number };

export async function correctorJoins({ telescope }: { telescope: string }): Promise<{ telescope: string; correctors: CorrectorJoin[] }> {
  const row = await getPartOrThrow({ ref: telescope });
  if (row.kind !== "optics" || row.specs.opticsRole !== "telescope") {
    throw new AppError("bad_request:validation", `${row.maker} ${row.model} is not a telescope.`, { telescope: ["Not a telescope"] });
  }
  const catalog = await catalogConnectors();
  const scope = { ...rowToSolverPart(row), lengthMm: 0 };
  const correctors: CorrectorJoin[] = [];
  for (const c of catalog.rows.values()) {
    if (c.kind !== "optics" || c.specs.opticsRole !== "corrector") continue;
    const end = { ...rowToSolverPart(c), rear: null, lengthMm: 0 };
    // Same limits as the plan's own telescope → corrector link (run-plan.ts).
    const link = solveTrain({ optics: scope, camera: end, parts: catalog.connectors, maxSolutions: 1, maxParts: 6 });
    correctors.push({ slug: c.slug, joins: link.status === "ok", adapters: link.solutions[0]?.partCount ?? 0 });
  }
  return { telescope: row.slug, correctors };
}
