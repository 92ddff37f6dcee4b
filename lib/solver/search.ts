// The window search, contract v2: the best multiset of each of the first maxSolutions
// geometries by (warned, parts, detours, |error|, price, D), with up to 3 variants each.
//
// Two phases: first only chains with no vignetting or load warning, level by level in the
// number of parts; then, if fewer than maxSolutions geometries were found, the warned ones
// (every unwarned geometry is known by then, since phase one never filled up). Inside a
// level, branch and bound on (detours ≥ 0, |error|, price, D): the walker's relaxed bound
// leaves detours at 0, which is a valid lower bound. At each leaf the multiset gets its best
// ordering exactly (orderings.ts) before it is ranked.

import { getClasses } from "./classes";
import { cleanPruner, everyChainWarned, warningsPossible } from "./clean";
import { bestOrdering, better, containsBetter, dress, OUT_OF_WORK, spend } from "./orderings";
import { type Problem, WORK_LIMIT } from "./problem";
import { Reach, requestGrain } from "./reach";
import type { Tables } from "./tables";
import { cmpBound, cmpEntry, type Entry, GeoTop, RANK_EPS } from "./topk";
import type { Chain } from "./types";
import { type Bound, Walker } from "./walker";

function keysOf(p: Problem, counts: ReadonlyMap<number, number>): { msKey: string; geoKey: string } {
  const { classOf } = getClasses(p.model);
  const ids: string[] = [], geo: number[] = [];
  for (const [part, c] of counts) for (let i = 0; i < c; i++) { ids.push(p.model.parts[part].id); geo.push(classOf[part]); }
  return { msKey: ids.sort().join("\u0000"), geoKey: geo.sort((a, b) => a - b).join(",") };
}

function countsOf(p: Problem, moves: readonly number[]): Map<number, number> {
  const counts = new Map<number, number>();
  for (const mv of moves) if (mv >= 0) { const part = p.model.oPart[mv]; counts.set(part, (counts.get(part) ?? 0) + 1); }
  return counts;
}

/**
 * Rank one multiset in its best ordering; null when it is no solution. The walker itself
 * visits every ordering except where same-face spacers sit (always at a face's first
 * arrival), and those positions never change detours, only vignetting: so another ordering
 * is looked for only when this one is warned and holds such a spacer. (In phase two every
 * multiset is warned in all orderings, or its geometry was found in phase one.)
 */
function entryFor(p: Problem, counts: Map<number, number>, moves: readonly number[], phase: string, k: number, err: number, price: number, d: number): Entry | null {
  let best = dress(p, moves);
  if (best.warned && phase !== "warned" && moves.some((mv) => mv >= 0 && p.model.oFrom[mv] === p.model.oTo[mv])) {
    // Another ordering may do better; on a tie the walker's own ordering stays.
    const other = bestOrdering(p, counts);
    if (other && better(other, best)) best = other;
  }
  if (p.target === null && containsBetter(p, counts, best.warned)) return null;
  return { warned: best.warned, k, detours: best.detours, err, price, d, ...keysOf(p, counts), counts, ord: best };
}

/**
 * phaseOneShare: phase one's share of the request's work. It no longer has to walk the
 * window's warned chains to prove that no clean one exists (clean.ts prunes every state with
 * no clean way into the window), so this is only the k-SUM safety net of WORK_LIMIT, split so
 * that phase two still answers: past it the answer is flagged `truncated` and phase two (which
 * then also takes clean chains) goes on with the rest. Tests set it low to show that phase one
 * stays small where the window is full of warned chains.
 */
export const searchTuning = { phaseOneShare: WORK_LIMIT / 2 };

export function searchSolutions(p: Problem, t: Tables): Chain[] {
  const T = p.target;
  const reach = T === null ? null : new Reach(p, p.hi, requestGrain(p));
  const heads: Entry[] = [];
  const unwarnedGeos = new Set<string>();
  let top = new GeoTop(p.maxSolutions);
  let k = 0;
  let phase: "unwarned" | "warned" | "after-cut" = "unwarned";
  const need = T === null ? { a: -Infinity, b: Infinity } : { a: p.lo, b: p.hi };
  const W = t.R + 1;

  const clean = cleanPruner(p, t, need);
  const walker = new Walker(p, t, reach, {
    need: () => need,
    enter: clean ? (leg, li, r, cmin, cadj, moves) => phase !== "unwarned" || clean.enter(leg, li, r, cmin, cadj, moves) : undefined,
    sharpen: clean ? {
      level: () => (phase === "unwarned" ? clean.sharpen.level() : Infinity),
      ensure: (k) => { if (phase === "unwarned") clean.sharpen.ensure(k); },
    } : undefined,
    order: {
      bound(leg, li, r, cmin, cadj, price): Bound | null {
        const ti = li * W + r;
        const worst = top.full ? top.worst! : null;
        const dMin = cmin + t.minLen[leg][ti];
        let err = 0, d = dMin;
        if (T !== null) {
          const dMax = cmin + cadj + t.maxLen[leg][ti];
          err = Math.max(0, dMin - T, T - dMax, reach!.distance(leg, li, r, T - cmin - cadj, T - cmin));
          if (worst && worst.detours === 0) d = Math.max(dMin, T - worst.err);
        }
        const bound = { err, price: price + t.minPrice[leg][ti], d };
        // Ties with the current last place are pruned too: equal keys may come out either way.
        return worst && cmpBound(bound, worst) >= 0 ? null : bound;
      },
      verdict(b) {
        if (!top.full) return "go";
        const worst = top.worst!;
        if (worst.detours === 0 && b.err > worst.err + RANK_EPS) return "stop"; // siblings come in |error| order
        return cmpBound(b, worst) >= 0 ? "skip" : "go";
      },
    },
    complete(dMin, dMax, price, moves) {
      let d = dMin, err = 0;
      if (T !== null) {
        d = Math.min(Math.max(T, dMin), dMax);
        if (d < p.lo || d > p.hi) return;
        err = Math.abs(d - T);
      }
      if (top.full) {
        const worst = top.worst!;
        if (worst.detours === 0 && cmpBound({ err, price, d }, worst) > 0) return;
      }
      const counts = countsOf(p, moves);
      if (phase === "warned" && unwarnedGeos.has(keysOf(p, counts).geoKey)) return;
      const e = entryFor(p, counts, moves, phase, k, err, price, d);
      if (!e) return;
      if (phase === "unwarned" ? e.warned : phase === "warned" ? !e.warned || unwarnedGeos.has(e.geoKey) : unwarnedGeos.has(e.geoKey)) return;
      top.offer(e);
    },
  });

  let cut = false;
  try {
    for (const ph of ["unwarned", "warned"] as const) {
      if (ph === "warned" && (heads.length >= p.maxSolutions || !warningsPossible(p))) break;
      if (ph === "unwarned" && everyChainWarned(p)) continue;
      phase = ph;
      const rest = p.work.left;
      const share = searchTuning.phaseOneShare;
      if (ph === "unwarned") p.work.left = Math.min(rest, share);
      try {
        for (k = 0; k <= p.maxParts && heads.length < p.maxSolutions && !p.work.exhausted; k++) {
          top = new GeoTop(p.maxSolutions - heads.length);
          if (ph === "unwarned" && clean) {
            clean.ensure(k);
            // Once phase one needed its bitsets, the next level needs them too: build them now.
            if (clean.sharpen.level() >= 0) clean.sharpen.ensure(k);
          }
          walker.run(k);
          heads.push(...top.items);
        }
      } catch (e) {
        if (e !== OUT_OF_WORK || ph !== "unwarned") throw e;
        heads.push(...top.items);
      }
      if (ph === "unwarned") {
        for (const h of heads) unwarnedGeos.add(h.geoKey);
        // Phase two goes on with what the request has left, not with what is left of the share.
        p.work.left = Math.max(0, rest - (Math.min(rest, share) - Math.max(0, p.work.left)));
        if (p.work.exhausted) {
          cut = true;
          p.work.exhausted = false;
          phase = "after-cut";
        }
      }
    }
  } catch (e) {
    if (e !== OUT_OF_WORK) throw e;
    heads.push(...top.items.filter((x) => !heads.includes(x)));
  }
  if (cut) p.work.exhausted = true;
  heads.sort(cmpEntry);
  const out: Chain[] = [];
  for (const h of heads) {
    let variants: Chain[] = [];
    try { variants = variantsOf(p, h).map((v) => v.ord.chain); } catch (e) { if (e !== OUT_OF_WORK) throw e; }
    out.push({ ...h.ord.chain, variants });
  }
  return out;
}

/**
 * The next up to 3 multisets of the head's geometry, best first: every choice of makers per
 * class (stock honoured), each in its best ordering, branch and bound on price.
 */
function variantsOf(p: Problem, head: Entry): Entry[] {
  const { classOf, members } = getClasses(p.model);
  const need = new Map<number, number>();
  for (const [part, c] of head.counts) need.set(classOf[part], (need.get(classOf[part]) ?? 0) + c);
  const classes = [...need.entries()];
  if (classes.every(([c]) => members[c].length === 1)) return [];
  const price = (i: number) => p.model.parts[i].priceCents ?? Infinity;
  const minRest: number[] = new Array(classes.length + 1).fill(0);
  for (let i = classes.length - 1; i >= 0; i--) minRest[i] = minRest[i + 1] + classes[i][1] * price(members[classes[i][0]][0]);
  const best: Entry[] = [];
  const counts = new Map<number, number>();
  const q = p.model.quantity;

  const leaf = (cost: number) => {
    const { msKey } = keysOf(p, counts);
    if (msKey === head.msKey) return;
    const ord = bestOrdering(p, counts);
    if (!ord) return;
    const copy = new Map(counts);
    if (p.target === null && containsBetter(p, copy, ord.warned)) return;
    const e: Entry = { ...head, warned: ord.warned, detours: ord.detours, price: cost, msKey, counts: copy, ord };
    if (best.length >= 3 && cmpEntry(e, best[2]) >= 0) return;
    let i = best.length;
    while (i > 0 && cmpEntry(e, best[i - 1]) < 0) i--;
    best.splice(i, 0, e);
    if (best.length > 3) best.pop();
  };
  // Class ci, member index j within it, slots still to fill in this class.
  const rec = (ci: number, j: number, left: number, cost: number): void => {
    spend(p);
    if (ci === classes.length) { leaf(cost); return; }
    const list = members[classes[ci][0]];
    if (left === 0) { rec(ci + 1, 0, ci + 1 < classes.length ? classes[ci + 1][1] : 0, cost); return; }
    if (j >= list.length) return;
    // Lower bound: the rest at the cheapest remaining member (members are sorted by price).
    if (best.length >= 3) {
      const w = best[2];
      const lb = cost + left * price(list[j]) + minRest[ci + 1];
      if (!w.warned && w.detours === 0 && lb > w.price) return;
    }
    const part = list[j];
    const most = Math.min(left, q[part]);
    for (let c = most; c >= 0; c--) {
      if (c > 0) counts.set(part, c); else counts.delete(part);
      rec(ci, j + 1, left - c, c > 0 ? cost + c * price(part) : cost); // 0 × unknown price is no NaN
    }
    counts.delete(part);
  };
  rec(0, 0, classes[0]?.[1] ?? 0, 0);
  return best;
}
