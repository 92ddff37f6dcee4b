// Reading a saved build's canonical result: the chosen chain, the parts it uses, what to buy.
import type { PlanItem, PlanResponse } from "@/lib/planner/api-types";
import type { Chain } from "@/lib/solver/types";

export const stripOwned = (id: string) => id.replace(/~owned$/, "");

export function chosenChain(result: PlanResponse, solutionIndex: number): Chain | null {
  return result.solutions[solutionIndex] ?? null;
}

/** The telescope → corrector link drawn in front of the corrector, when there is one. */
export function chosenTelescopeLink(result: PlanResponse): Chain | null {
  return result.telescopeLink?.solutions[0] ?? result.telescopeLink?.shortest ?? null;
}

/** Every catalog slug a build depends on: optics, telescope, stations, camera and the chain's connectors. */
export function collectPartIds(result: PlanResponse, chain: Chain): string[] {
  const ids = new Set<string>();
  const ctx = result.context;
  const add = (id: string | null | undefined) => {
    if (!id) return;
    ids.add(stripOwned(ctx.items[id]?.slug ?? id));
  };
  add(ctx.opticsId);
  add(ctx.telescopeId);
  add(ctx.cameraId);
  for (const id of ctx.stationIds) add(id);
  for (const s of chain.steps) add(s.partId);
  for (const s of chosenTelescopeLink(result)?.steps ?? []) if (s.role === "connector") add(s.partId);
  return [...ids].sort();
}

/** The sorted multiset of connecting parts, owned or not: what "the same chain" means. */
export function connectorKey(chain: Chain): string {
  return chain.steps.filter((s) => s.role === "connector").map((s) => stripOwned(s.partId)).sort().join("|");
}

export function itemOf(result: PlanResponse, id: string): PlanItem {
  return result.context.items[id] ?? {
    id, slug: stripOwned(id), name: stripOwned(id), maker: "", model: stripOwned(id), kind: "other",
    front: null, rear: null, lengthMm: 0, adjustMm: null, clearApertureMm: null, weightG: null, priceCents: null, owned: id.endsWith("~owned"),
  };
}

export type ShoppingLine = { id: string; item: PlanItem; count: number; role: "optics" | "telescope" | "station" | "connector" | "camera"; toBuy: boolean; unitPriceCents: number | null };

/** The parts list, sky to sensor, with connecting parts grouped; owned ones are not to buy. */
export function shoppingList(result: PlanResponse, chain: Chain): ShoppingLine[] {
  const ctx = result.context;
  const lines: ShoppingLine[] = [];
  const seen = new Map<string, ShoppingLine>();
  const push = (id: string, role: ShoppingLine["role"]) => {
    const existing = seen.get(`${role}:${id}`);
    if (existing) { existing.count += 1; return; }
    const item = itemOf(result, id);
    const line: ShoppingLine = { id, item, count: 1, role, toBuy: role === "connector" && !item.owned, unitPriceCents: item.priceCents };
    seen.set(`${role}:${id}`, line);
    lines.push(line);
  };
  if (ctx.telescopeId) push(ctx.telescopeId, "telescope");
  for (const s of chosenTelescopeLink(result)?.steps ?? []) if (s.role === "connector") push(s.partId, "connector");
  push(ctx.opticsId, "optics");
  for (const s of chain.steps) push(s.partId, s.role === "camera" ? "camera" : s.role === "station" ? "station" : "connector");
  return lines;
}

/** Σ price of the connecting parts still to buy; null when any price is unknown. */
export function toBuyTotalCents(lines: ShoppingLine[]): number | null {
  let total = 0;
  for (const l of lines) {
    if (!l.toBuy) continue;
    if (l.unitPriceCents === null) return null;
    total += l.unitPriceCents * l.count;
  }
  return total;
}
