// A wheel or drawer whose spec says what filters it holds, in a plan that declares no glass:
// the planner asks whether to count that glass (2 mm of glass moves focus about 0.7 mm).
import type { PlanResponse } from "./api-types";

export type FilterPrompt = { stationId: string; name: string; thicknessMm: number };

export function uncountedFilters(result: Pick<PlanResponse, "context">, glassDeclared: boolean): FilterPrompt | null {
  if (glassDeclared) return null;
  const ctx = result.context;
  for (const id of ctx.stationIds) {
    const item = ctx.items[id];
    if (!item || (item.kind !== "filter-wheel" && item.kind !== "filter-drawer")) continue;
    if (typeof item.filterThicknessMm === "number" && item.filterThicknessMm > 0) {
      return { stationId: id, name: item.name, thicknessMm: item.filterThicknessMm };
    }
  }
  return null;
}
