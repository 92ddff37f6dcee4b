import "server-only";
// Which correctors a telescope can carry: directly, or through catalog adapters. The corrector
// picker marks those and lists them first, so a new user is not offered a reducer whose
// thread the focuser does not have.
import { getPartOrThrow } from "@/db/queries/parts";
import { AppError } from "@/lib/errors";
import { catalogConnectors } from "./run-plan";
import { solveLink } from "./telescope-link";

export type CorrectorJoin = { slug: string; joins: boolean; adapters: number };

export async function correctorJoins({ telescope }: { telescope: string }): Promise<{ telescope: string; correctors: CorrectorJoin[] }> {
  const row = await getPartOrThrow({ ref: telescope });
  if (row.kind !== "optics" || row.specs.opticsRole !== "telescope") {
    throw new AppError("bad_request:validation", `${row.maker} ${row.model} is not a telescope.`, { telescope: ["Not a telescope"] });
  }
  const catalog = await catalogConnectors();
  const correctors: CorrectorJoin[] = [];
  for (const c of catalog.rows.values()) {
    if (c.kind !== "optics" || c.specs.opticsRole !== "corrector") continue;
    const link = solveLink(row, c, catalog.connectors);
    correctors.push({ slug: c.slug, joins: link.status === "ok", adapters: link.solutions[0]?.partCount ?? 0 });
  }
  return { telescope: row.slug, correctors };
}
