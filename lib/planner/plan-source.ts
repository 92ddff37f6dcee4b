import "server-only";
// Step 1 of a plan: the parts the solver may draw from — the request's own, the catalog, what
// the viewer owns before the catalog, or one shop's stock.
import { listOwnedParts } from "@/db/queries/gear";
import type { SessionUser } from "@/lib/auth/session";
import { CONNECTOR_KINDS, rowToPlanItem, rowToSolverPart } from "@/lib/catalog/to-solver";
import { AppError } from "@/lib/errors";
import { shopStockSource } from "@/lib/shops/stock-source";
import type { Part } from "@/lib/solver";
import type { PlanItem } from "./api-types";
import type { Catalog } from "./catalog-cache";
import type { PlanInput } from "./run-plan";

export type ShopStock = Awaited<ReturnType<typeof shopStockSource>>;

/** The parts to draw from; owned copies are described in `items` (as `<slug>~owned`). */
export async function partsToDrawFrom({ input, viewer, catalog, items }: {
  input: PlanInput; viewer: SessionUser | null; catalog: Catalog; items: Record<string, PlanItem>;
}): Promise<{ parts: Part[]; shopStock: ShopStock | null }> {
  if (input.parts) return { parts: input.parts, shopStock: null };
  if (!input.source || input.source.kind === "catalog") return { parts: catalog.connectors, shopStock: null };
  if (input.source.kind === "owned") {
    if (!viewer) throw new AppError("unauthorized", "Sign in to plan with the parts you own.");
    const owned = (await listOwnedParts({ userId: viewer.id })).filter((o) => CONNECTOR_KINDS.has(o.part.kind));
    for (const o of owned) items[`${o.part.slug}~owned`] = rowToPlanItem(o.part, { owned: true });
    return { parts: [...owned.map((o) => rowToSolverPart(o.part, { owned: true, quantity: o.quantity })), ...catalog.connectors], shopStock: null };
  }
  if (input.source.kind === "shop") {
    const shopStock = await shopStockSource({ source: input.source, viewer, items, catalog });
    return { parts: shopStock.parts, shopStock };
  }
  throw new AppError("bad_request:source", "Ask every shop at once through POST /api/v1/solve, not inside a plan.", { "source.kind": ["Not here"] });
}
