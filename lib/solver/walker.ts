// The exact depth-first walk over chains with exactly k connecting parts. It honours stock,
// station order and reversibility exactly, and only enters a (leg, face, length) state from
// which some chain can still put a point of its length range [Dmin, Dmax] inside the
// searcher's current need [A, B] (bitset relaxation, see reach.ts).
//
// Spacers (parts whose front and rear leave the same open face) are "loops". A chain can
// always be rewritten so that all loops at a face sit together, in orientation order, at
// the first arrival at that face; the walk only builds chains of that shape, which cuts
// the permutations without losing any multiset.

import type { Problem } from "./problem";
import type { Reach } from "./reach";
import type { Tables } from "./tables";
import { stationMove } from "./topk";

export type Searcher = {
  /** The lengths at least one point of a finished chain's range must fall in. */
  need(): { a: number; b: number };
  /** Optional pruning with relaxed lower bounds; return false to skip the subtree. */
  promising?(leg: number, li: number, r: number, cmin: number, cadj: number, price: number): boolean;
  complete(dMin: number, dMax: number, price: number, moves: readonly number[], used: Int32Array): void;
};

const SLACK = 1e-9;
/**
 * States a walk may visit before it stops to sharpen the bitset bound (doubles each time).
 * Tests set it to 0 to force the bitsets on every level.
 */
export const tuning = { walkBudget: 4000 };
const ABORT = Symbol("sharpen the bound and walk again");
const EXHAUSTED = Symbol("out of work for this request");

function lowerBound(arr: Float64Array, from: number, to: number, x: number): number {
  let lo = from, hi = to;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (arr[mid] < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

export class Walker {
  private readonly used: Int32Array;
  private readonly visit: Int32Array;
  private readonly moves: number[] = [];
  private k = 0;
  private spent = 0;
  private budget = Infinity;
  nodes = 0;

  constructor(private readonly p: Problem, private readonly t: Tables, private readonly reach: Reach | null, private readonly s: Searcher) {
    this.used = new Int32Array(p.model.parts.length);
    this.visit = new Int32Array(p.faces.size);
  }

  /**
   * Walk every canonical chain with exactly k connecting parts. The bitset relaxation is
   * built one level at a time, only when the walk proves expensive: on easy catalogs the
   * scalar bounds alone keep it to a few hundred states, and the bitsets would cost more
   * than they save. An interrupted walk is simply redone with the sharper bound; whatever
   * it had already reported was a real chain and stays valid.
   */
  run(k: number): void {
    const { p } = this;
    if (p.start < 0 || p.loc[0][p.start] < 0 || p.work.exhausted) return;
    this.k = k;
    this.t.ensure(k);
    let budget = tuning.walkBudget;
    for (;;) {
      const reach = this.reach;
      this.budget = reach && reach.level < k ? this.spent + budget : Infinity;
      this.used.fill(0);
      this.visit.fill(0);
      this.moves.length = 0;
      this.visit[p.start] = 1;
      try {
        this.node(0, p.start, 0, 0, 0, 0, -1);
        return;
      } catch (e) {
        if (e === EXHAUSTED) { p.work.exhausted = true; return; }
        if (e !== ABORT) throw e;
        reach!.ensure(reach!.level + 1);
        budget = Math.max(1, budget * 2);
      }
    }
  }

  private node(leg: number, f: number, cmin: number, cadj: number, price: number, u: number, loopMin: number): void {
    const { p, t, s } = this;
    const li = p.loc[leg][f];
    if (li < 0) return;
    this.nodes++;
    if (++this.spent > this.budget) throw ABORT;
    if (--p.work.left < 0) throw EXHAUSTED;
    const r = this.k - u;
    const W = t.R + 1;
    const ti = li * W + r;
    const restMin = t.minLen[leg][ti];
    if (restMin === Infinity) return;
    const { a, b } = s.need();
    if (cmin + restMin > b + SLACK || cmin + cadj + t.maxLen[leg][ti] < a - SLACK) return;
    if (this.reach && !this.reach.any(leg, li, r, a - cmin - cadj, b - cmin)) return;
    if (s.promising && !s.promising(leg, li, r, cmin, cadj, price)) return;

    const m = p.model;
    if (r > 0 && f < m.faces.size) {
      const here = p.loc[leg];
      for (let g = m.faceOut[f]; g < m.faceOut[f + 1]; g++) {
        const to = m.gTo[g];
        const lt = here[to];
        if (lt < 0) continue;
        const j = lt * W + r - 1;
        const rMin = t.minLen[leg][j];
        if (rMin === Infinity) continue;
        const loop = to === f;
        let o = m.gStart[g];
        const end = m.gEnd[g];
        if (loop) {
          if (this.visit[f] !== 1) continue;
          if (loopMin > o) o = loopMin;
        }
        const lenHi = b - cmin - rMin + SLACK;
        const lenLo = a - cmin - cadj - t.maxLen[leg][j] - m.gMaxAdj[g] - SLACK;
        if (lenLo > m.oLen[o]) o = lowerBound(m.oLen, o, end, lenLo);
        for (; o < end; o++) {
          const len = m.oLen[o];
          if (len > lenHi) break;
          const part = m.oPart[o];
          if (this.used[part] >= m.quantity[part]) continue;
          this.used[part]++;
          this.moves.push(o);
          if (!loop) this.visit[to]++;
          this.node(leg, to, cmin + len, cadj + m.oAdj[o], price + m.oPrice[o], u + 1, loop ? o : -1);
          if (!loop) this.visit[to]--;
          this.moves.pop();
          this.used[part]--;
        }
      }
    }

    if (leg < p.S) {
      for (const mt of p.exits[leg]) {
        if (mt.entry !== f) continue;
        this.moves.push(stationMove(mt.station, mt.rev));
        this.visit[mt.exit]++;
        this.node(leg + 1, mt.exit, cmin + mt.len, cadj + mt.adj, price, u, -1);
        this.visit[mt.exit]--;
        this.moves.pop();
      }
    } else if (r === 0 && f === p.camEntry) {
      const dMin = cmin + p.camLen;
      s.complete(dMin, dMin + cadj + p.camAdj, price, this.moves, this.used);
    }
  }
}
