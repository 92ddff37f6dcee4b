// "What to stock next": from the solves made against a shop's stock that failed or needed
// parts the shop lacked, which catalog parts would have answered the most of them. Pure.
//
// Greedy cover: each pick is the part that, with the picks above it, completes the most
// still-unanswered solves (ties: the part most solves needed). A solve "needs" the parts its
// catalog answer used that the shop did not have in stock.

export type LoggedSolve = { outcome: "ok" | "short" | "none"; missingPartIds: string[] };
export type Suggestion = {
  partId: string;
  /** Solves whose catalog answer used this part. */
  needed: number;
  /** Solves that become answerable once this part (and the ones ranked above it) are stocked. */
  completes: number;
};

export function suggestStock(solves: LoggedSolve[], limit = 10): { suggestions: Suggestion[]; total: number; unanswered: number } {
  const open = solves.filter((s) => s.outcome === "short" && s.missingPartIds.length > 0).map((s) => new Set(s.missingPartIds));
  const unanswered = solves.filter((s) => s.outcome !== "ok").length;
  const needed = new Map<string, number>();
  for (const set of open) for (const id of set) needed.set(id, (needed.get(id) ?? 0) + 1);

  const chosen = new Set<string>();
  const done = new Set<number>();
  const suggestions: Suggestion[] = [];
  while (suggestions.length < limit) {
    let best: Suggestion | null = null;
    for (const [partId, n] of needed) {
      if (chosen.has(partId)) continue;
      let completes = 0;
      open.forEach((set, i) => {
        if (!done.has(i) && set.has(partId) && [...set].every((id) => id === partId || chosen.has(id))) completes++;
      });
      const cand = { partId, needed: n, completes };
      if (!best || cand.completes > best.completes || (cand.completes === best.completes && (cand.needed > best.needed || (cand.needed === best.needed && cand.partId < best.partId)))) best = cand;
    }
    if (!best) break;
    chosen.add(best.partId);
    open.forEach((set, i) => { if (!done.has(i) && [...set].every((id) => chosen.has(id))) done.add(i); });
    suggestions.push(best);
  }
  return { suggestions, total: solves.length, unanswered };
}
