// The window search: exact top-k distinct part multisets, level by level in the number of
// connecting parts (fewer parts always rank first), with branch and bound on the rest of
// the ranking key inside a level.

import type { Problem } from "./problem";
import { Reach, requestGrain } from "./reach";
import type { Tables } from "./tables";
import { cmpKey, type Found, RANK_EPS, TopK } from "./topk";
import { type Bound, Walker } from "./walker";

function multisetKey(p: Problem, moves: readonly number[]): string {
  const ids: string[] = [];
  for (const mv of moves) if (mv >= 0) ids.push(p.model.parts[p.model.oPart[mv]].id);
  return ids.sort().join("\u0000");
}

/**
 * With a target: chains whose D can be set inside [lo, hi], ranked by |error|, price, D.
 * Without: every chain, ranked by price, then D (adjustable parts at their shortest).
 */
export function searchSolutions(p: Problem, t: Tables): Found[] {
  const T = p.target;
  const reach = T === null ? null : new Reach(p, p.hi, requestGrain(p));
  const results: Found[] = [];
  let top = new TopK(p.maxSolutions);
  let k = 0;
  const need = T === null ? { a: -Infinity, b: Infinity } : { a: p.lo, b: p.hi };
  const W = t.R + 1;

  const walker = new Walker(p, t, reach, {
    need: () => need,
    order: {
      bound(leg, li, r, cmin, cadj, price): Bound | null {
        const ti = li * W + r;
        const worst = top.full ? top.worst! : null;
        const dMin = cmin + t.minLen[leg][ti];
        let err = 0, d = dMin;
        if (T !== null) {
          // Relaxed least |D − T|: from the bitsets where built, else from the length range.
          const dMax = cmin + cadj + t.maxLen[leg][ti];
          err = Math.max(0, dMin - T, T - dMax, reach!.distance(leg, li, r, T - cmin - cadj, T - cmin));
          // A chain that ties on |error| with the last place has D = T ± that error.
          if (worst) d = Math.max(dMin, T - worst.err);
        }
        const bound = { err, price: price + t.minPrice[leg][ti], d };
        // Ties with the current last place are pruned too: equal keys may come out either way.
        return worst && cmpKey({ k, ...bound }, worst) >= 0 ? null : bound;
      },
      verdict(b) {
        if (!top.full) return "go";
        const worst = top.worst!;
        if (b.err > worst.err + RANK_EPS) return "stop"; // siblings come in |error| order
        return cmpKey({ k, ...b }, worst) >= 0 ? "skip" : "go";
      },
    },
    complete(dMin, dMax, price, moves) {
      let d = dMin, err = 0;
      if (T !== null) {
        d = Math.min(Math.max(T, dMin), dMax);
        if (d < p.lo || d > p.hi) return;
        err = Math.abs(d - T);
      }
      const key = { k, err, price, d };
      if (top.full && cmpKey(key, top.worst!) > 0) return;
      top.offer({ ...key, moves: moves.slice(), msKey: multisetKey(p, moves) });
    },
  });

  for (k = 0; k <= p.maxParts && results.length < p.maxSolutions; k++) {
    top = new TopK(p.maxSolutions - results.length);
    walker.run(k);
    results.push(...top.items);
  }
  return results;
}
