import "server-only";
// The approved catalog as the planner uses it: rows by slug and the connecting parts as solver
// parts, rebuilt only when the catalog version changes, so the solver's graph cache (keyed by
// the connectors array) is reused across requests.
import { getCatalogVersion, listAllApprovedParts } from "@/db/queries/parts";
import type { PartRow } from "@/db/schema";
import { CONNECTOR_KINDS, rowToSolverPart } from "@/lib/catalog/to-solver";
import type { Part } from "@/lib/solver";

export type Catalog = { version: number; rows: Map<string, PartRow>; connectors: Part[] };

let catalogCache: Catalog | null = null;

export async function catalogConnectors(): Promise<Catalog> {
  const version = await getCatalogVersion();
  if (!catalogCache || catalogCache.version !== version) {
    const rows = await listAllApprovedParts();
    catalogCache = {
      version,
      rows: new Map(rows.map((r) => [r.slug, r])),
      connectors: rows.filter((r) => CONNECTOR_KINDS.has(r.kind)).map((r) => rowToSolverPart(r)),
    };
  }
  return catalogCache;
}
