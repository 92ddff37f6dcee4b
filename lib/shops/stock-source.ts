import "server-only";
// Plans drawn from one shop's stock (`source: { kind: "shop", shop }`): only parts it can sell
// now (available = on hand − reserved, as quantities) at its prices, after what the member
// owns when asked. Each such solve is logged anonymously for the shop's "what to stock next".
import { listOwnedParts } from "@/db/queries/gear";
import { getShopBySlugOrThrow } from "@/db/queries/shops";
import { listAvailableStock, recordShopSolve } from "@/db/queries/shops-inventory";
import type { SessionUser } from "@/lib/auth/session";
import { CONNECTOR_KINDS, rowToPlanItem, rowToSolverPart } from "@/lib/catalog/to-solver";
import { AppError } from "@/lib/errors";
import type { PlanItem } from "@/lib/planner/api-types";
import type { PartRow } from "@/db/schema";
import type { Part, SolveResult } from "@/lib/solver";

export type ShopRef = { slug: string; name: string; currency: string };
const FILL = "~catalog";

export async function shopStockSource({ source, viewer, items, catalog }: {
  source: { shop?: string; owned?: boolean };
  viewer: SessionUser | null;
  /** The plan's items, to describe owned copies in. */
  items: Record<string, PlanItem>;
  catalog: { rows: Map<string, PartRow>; connectors: Part[] };
}) {
  const shop = await getShopBySlugOrThrow({ slug: source.shop ?? "" });
  const stock = (await listAvailableStock({ organizationId: shop.id })).filter((s) => CONNECTOR_KINDS.has(s.part.kind));
  const priceOf = new Map(stock.map((s) => [s.part.slug, s.priceCents]));
  const parts: Part[] = stock.map((s) => ({ ...rowToSolverPart(s.part), quantity: s.available, priceCents: s.priceCents }));
  if (source.owned) {
    if (!viewer) throw new AppError("unauthorized", "Sign in to count the parts you own.");
    const owned = (await listOwnedParts({ userId: viewer.id })).filter((o) => CONNECTOR_KINDS.has(o.part.kind));
    for (const o of owned) items[`${o.part.slug}~owned`] = rowToPlanItem(o.part, { owned: true });
    parts.unshift(...owned.map((o) => rowToSolverPart(o.part, { owned: true, quantity: o.quantity })));
  }
  const ref: ShopRef = { slug: shop.slug, name: shop.name, currency: shop.currency };

  return {
    parts,
    shop: ref,
    /** The shop's prices on the items a chain uses (the catalog would give list prices). */
    priceItems(planItems: Record<string, PlanItem>) {
      for (const [id, item] of Object.entries(planItems)) if (priceOf.has(id)) planItems[id] = { ...item, priceCents: priceOf.get(id)! };
    },
    /**
     * Log how the shop's stock did. When it could not answer, solve again with the catalog
     * filling in behind the stock and keep which catalog parts that answer needed.
     */
    async record(result: SolveResult, solveWith: (parts: Part[]) => SolveResult) {
      if (result.status === "ok") return recordShopSolve({ organizationId: shop.id, outcome: "ok", missingPartIds: [] });
      const fill = catalog.connectors.map((p) => ({ ...p, id: `${p.id}${FILL}`, quantity: undefined }));
      const wider = solveWith([...parts, ...fill]);
      const best = wider.solutions[0];
      if (wider.status !== "ok" || !best) return recordShopSolve({ organizationId: shop.id, outcome: "none", missingPartIds: [] });
      const slugs = [...new Set(best.steps.map((s) => s.partId).filter((id) => id.endsWith(FILL)).map((id) => id.slice(0, -FILL.length)))];
      const ids = slugs.map((s) => catalog.rows.get(s)?.id).filter((id): id is string => !!id);
      return recordShopSolve({ organizationId: shop.id, outcome: "short", missingPartIds: ids });
    },
  };
}
