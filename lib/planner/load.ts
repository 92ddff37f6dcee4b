// What hangs from the focuser, computed once for the planner and for a saved build's page:
// the corrector (when it is separate from the telescope), the connectors in front of it, and
// every step of the chosen chain. The telescope itself never counts; an astrograph or a
// corrector chosen alone is the optics the load is measured from, so it does not either.
import type { Chain } from "@/lib/solver";
import type { PlanResponse } from "./api-types";

export type FocuserLoad = { grams: number; unknown: number; ratingG: number | null; over: boolean };

export function focuserLoad(result: Pick<PlanResponse, "context" | "telescopeLink">, chain: Chain | null): FocuserLoad {
  const ctx = result.context;
  const ids: string[] = [];
  if (ctx.telescopeId) {
    ids.push(ctx.opticsId);
    const link = result.telescopeLink?.solutions[0] ?? result.telescopeLink?.shortest ?? null;
    for (const s of link?.steps ?? []) if (s.role === "connector") ids.push(s.partId);
  }
  for (const s of chain?.steps ?? []) ids.push(s.partId);
  let grams = 0, unknown = 0;
  for (const id of ids) {
    const w = ctx.items[id]?.weightG;
    if (typeof w === "number") grams += w; else unknown++;
  }
  const ratingG = ctx.maxLoadG;
  return { grams, unknown, ratingG, over: ratingG !== null && grams > ratingG };
}
