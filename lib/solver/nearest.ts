// When nothing lands in the window: the largest D reachable below it and the smallest above
// it, both exact (stock, maxParts and stations honoured). Only asked when no chain's range
// [Dmin, Dmax] meets the window, so every chain lies wholly below or wholly above it.

import type { Problem } from "./problem";
import { Reach, requestGrain } from "./reach";
import type { Tables } from "./tables";
import { Walker } from "./walker";

const STRICT = 1e-7;

function nearestBelow(p: Problem, t: Tables, grain: number | null): number | null {
  if (p.lo <= 0) return null;
  let best = -Infinity;
  const reach = new Reach(p, p.lo, grain);
  const walker = new Walker(p, t, reach, {
    need: () => ({ a: best === -Infinity ? 0 : best + STRICT, b: p.lo - STRICT }),
    complete(_dMin, dMax) {
      if (dMax < p.lo && dMax > best) best = dMax;
    },
  });
  for (let k = 0; k <= p.maxParts; k++) walker.run(k);
  return best === -Infinity ? null : best;
}

function nearestAbove(p: Problem, t: Tables, grain: number | null): number | null {
  const li = p.loc[0][p.start];
  t.ensure(t.R);
  let ceiling = -Infinity;
  for (let r = 0; r <= t.R; r++) ceiling = Math.max(ceiling, t.maxLen[0][li * (t.R + 1) + r]);
  if (!(ceiling > p.hi)) return null;
  let cap = p.hi + Math.max(10, 0.25 * p.hi);
  for (;;) {
    let best = Infinity;
    const limit = cap;
    const reach = new Reach(p, limit, grain);
    const walker = new Walker(p, t, reach, {
      need: () => ({ a: p.hi + STRICT, b: Math.min(best - STRICT, limit) }),
      complete(dMin) {
        if (dMin > p.hi && dMin < best) best = dMin;
      },
    });
    for (let k = 0; k <= p.maxParts; k++) walker.run(k);
    if (best < Infinity) return best;
    if (cap >= ceiling) return null;
    cap = p.hi + 2 * (cap - p.hi);
  }
}

export function findNearest(p: Problem, t: Tables): { belowMm: number | null; aboveMm: number | null } {
  const grain = requestGrain(p);
  return { belowMm: nearestBelow(p, t, grain), aboveMm: nearestAbove(p, t, grain) };
}
