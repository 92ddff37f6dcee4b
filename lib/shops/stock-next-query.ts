import "server-only";
import { listPartsByIds, listShopSolvesSince } from "@/db/queries/shops-inventory";
import { suggestStock, type LoggedSolve } from "./stock-next";

export const STOCK_NEXT_DAYS = 30;

/** The shop's suggestions from the solves of the last 30 days, with the parts' names. */
export async function stockNextForShop({ organizationId, now = new Date() }: { organizationId: string; now?: Date }) {
  const since = new Date(now.getTime() - STOCK_NEXT_DAYS * 86_400_000);
  const solves = await listShopSolvesSince({ organizationId, since });
  const { suggestions, total, unanswered } = suggestStock(solves as LoggedSolve[]);
  const parts = new Map((await listPartsByIds({ ids: suggestions.map((s) => s.partId) })).map((p) => [p.id, p]));
  return {
    days: STOCK_NEXT_DAYS, total, unanswered,
    suggestions: suggestions.filter((s) => parts.has(s.partId)).map((s) => ({ ...s, part: parts.get(s.partId)! })),
  };
}
