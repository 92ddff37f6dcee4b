import "server-only";
// Which correctors a telescope can carry: directly, or through catalog adapters. The corrector
// picker marks those and lists them first, so a new user is not offered a reducer whose
// thread the focuser does not have.
import { getPartOrThrow } from "@/db/queries/parts";
import { AppError } from "@/lib/errors";
import { catalogConnectors } from "./catalog-cache";
import { solveLink } from "./telescope-link";

export type CorrectorJoin = { slug: string; joins: boolean; adapters: number };

type Joins = { telescope: string; correctors: CorrectorJoin[] };

// One link solve per corrector is too much to repeat on every planner load: keep the answer per
// telescope until the catalog changes (the catalog cache in catalog-cache.ts is keyed the same way).
const joinsCache = new Map<string, { version: number; joins: Joins }>();

export async function correctorJoins({ telescope }: { telescope: string }): Promise<Joins> {
  const row = await getPartOrThrow({ ref: telescope });
  const catalog = await catalogConnectors();
  const hit = joinsCache.get(row.slug);
  if (hit && hit.version === catalog.version) return hit.joins;
  if (row.kind !== "optics" || row.specs.opticsRole !== "telescope") {
    throw new AppError("bad_request:validation", `${row.maker} ${row.model} is not a telescope.`, { telescope: ["Not a telescope"] });
  }
  const correctors: CorrectorJoin[] = [];
  for (const c of catalog.rows.values()) {
    if (c.kind !== "optics" || c.specs.opticsRole !== "corrector") continue;
    const link = solveLink(row, c, catalog.connectors);
    correctors.push({ slug: c.slug, joins: link.status === "ok", adapters: link.solutions[0]?.partCount ?? 0 });
  }
  const joins = { telescope: row.slug, correctors };
  joinsCache.set(row.slug, { version: catalog.version, joins });
  return joins;
}
