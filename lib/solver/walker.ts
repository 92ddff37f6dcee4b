// The exact depth-first walk over chains with exactly k connecting parts. It honours stock,
// station order and reversibility exactly, and only enters a (leg, face, length) state from
// which some chain can still put a point of its length range [Dmin, Dmax] inside the
// searcher's current need [A, B] (bitset relaxation, see reach.ts).
//
// Spacers (parts whose front and rear leave the same open face) are "loops". A chain can
// always be rewritten so that all loops at a face sit together, in orientation order, at
// the first arrival at that face; the walk only builds chains of that shape, which cuts
// the permutations without losing any multiset.

import type { Problem, StationMount } from "./problem";
import type { Reach } from "./reach";
import type { Tables } from "./tables";
import { stationMove } from "./moves";
import { cmpPrice } from "./topk";

/** A relaxed lower bound on the ranking key (|error|, price, D) of any chain through a state. */
export type Bound = { err: number; price: number; d: number };

export type Searcher = {
  /** The lengths at least one point of a finished chain's range must fall in. */
  need(): { a: number; b: number };
  /** Ranked searches: bound each state, and judge a bound against the current last place. */
  order?: {
    bound(leg: number, li: number, r: number, cmin: number, cadj: number, price: number): Bound | null;
    verdict(b: Bound): "go" | "skip" | "stop";
  };
  complete(dMin: number, dMax: number, price: number, moves: readonly number[], used: Int32Array): void;
  /**
   * Optional exact-safe pruning on the chain so far (e.g. "no clean finish"): false prunes the
   * state; a function is a test every connector orientation that may follow must pass (it
   * turns children away before they count as states).
   */
  enter?(leg: number, li: number, r: number, cmin: number, cadj: number, moves: readonly number[]): KidTest | boolean;
  /** A relaxation of the searcher's own that is built, like the walker's bitsets, only when a walk proves expensive. */
  sharpen?: { level(): number; ensure(k: number): void };
};

/** Whether connector orientation o may follow the state it was made for. */
export type KidTest = (o: number) => boolean;

const SLACK = 1e-9;
/**
 * walkBudget: states a walk may visit before it stops to build the bitset bound (tests set
 * 0 to force the bitsets on every level). sortLimit: most siblings bounded and sorted
 * best-first; beyond it (a face with hundreds of spacers) they are walked in length order.
 */
export const tuning = { walkBudget: 4000, sortLimit: 128 };
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
   * built only when the walk proves expensive: on easy catalogs the scalar bounds alone keep
   * it to a few hundred states and the bitsets would cost more than they save. An
   * interrupted walk is redone with the bitsets for every level up to k; whatever it had
   * already reported was a real chain and stays valid.
   */
  run(k: number): void {
    const { p } = this;
    if (p.start < 0 || p.loc[0][p.start] < 0 || p.work.exhausted) return;
    this.k = k;
    this.t.ensure(k);
    const budget = tuning.walkBudget;
    const { reach, s } = this;
    for (;;) {
      const lagging = (reach !== null && reach.level < k) || (s.sharpen !== undefined && s.sharpen.level() < k);
      this.budget = lagging ? this.spent + budget : Infinity;
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
        reach?.ensure(k);
        s.sharpen?.ensure(k);
      }
    }
  }

  /** Relaxed checks for a state; false when no chain through it can meet the need. */
  private viable(leg: number, li: number, r: number, cmin: number, cadj: number): boolean {
    const { t } = this;
    const ti = li * (t.R + 1) + r;
    const restMin = t.minLen[leg][ti];
    if (restMin === Infinity) return false;
    const { a, b } = this.s.need();
    if (cmin + restMin > b + SLACK || cmin + cadj + t.maxLen[leg][ti] < a - SLACK) return false;
    return !this.reach || this.reach.any(leg, li, r, a - cmin - cadj, b - cmin);
  }

  /**
   * Every connector orientation that may follow face f with r parts left, in length order:
   * same-face spacers only at the first arrival and in orientation order (see above), and
   * only lengths that can still meet the need (binary search on the sorted group).
   */
  private candidates(leg: number, f: number, cmin: number, cadj: number, r: number, loopMin: number, kidTest: KidTest | null, take: (o: number, to: number, loop: boolean) => void): void {
    const { p, t } = this;
    const m = p.model;
    if (r <= 0 || f >= m.faces.size) return;
    const W = t.R + 1;
    const { a, b } = this.s.need();
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
      if (o < end && lenLo > m.oLen[o]) o = lowerBound(m.oLen, o, end, lenLo);
      for (; o < end && m.oLen[o] <= lenHi; o++) {
        const part = m.oPart[o];
        if (this.used[part] < m.quantity[part] && (!kidTest || kidTest(o))) take(o, to, loop);
      }
    }
  }

  private tick(): void {
    this.nodes++;
    if (++this.spent > this.budget) throw ABORT;
    if (--this.p.work.left < 0) throw EXHAUSTED;
  }

  private node(leg: number, f: number, cmin: number, cadj: number, price: number, u: number, loopMin: number): void {
    const { p, s } = this;
    const li = p.loc[leg][f];
    if (li < 0) return;
    this.tick();
    const r = this.k - u;
    if (!this.viable(leg, li, r, cmin, cadj)) return;
    const test = s.enter ? s.enter(leg, li, r, cmin, cadj, this.moves) : true;
    if (test === false) return;
    const kidTest = test === true ? null : test;
    if (s.order) {
      if (!s.order.bound(leg, li, r, cmin, cadj, price)) return;
      this.ordered(leg, f, cmin, cadj, price, u, loopMin, kidTest);
      return;
    }

    this.candidates(leg, f, cmin, cadj, r, loopMin, kidTest, (o) => this.step(o, leg, f, cmin, cadj, price, u));
    if (leg < p.S) {
      for (const mt of p.exits[leg]) if (mt.entry === f) this.station(mt, leg, cmin, cadj, price, u);
    } else if (r === 0 && f === p.camEntry) {
      const dMin = cmin + p.camLen;
      s.complete(dMin, dMin + cadj + p.camAdj, price, this.moves, this.used);
    }
  }

  /** Put connector orientation o after face f and walk on. */
  private step(o: number, leg: number, f: number, cmin: number, cadj: number, price: number, u: number): void {
    const m = this.p.model;
    const part = m.oPart[o], to = m.oTo[o], loop = to === f;
    this.used[part]++;
    this.moves.push(o);
    if (!loop) this.visit[to]++;
    this.node(leg, to, cmin + m.oLen[o], cadj + m.oAdj[o], price + m.oPrice[o], u + 1, loop ? o : -1);
    if (!loop) this.visit[to]--;
    this.moves.pop();
    this.used[part]--;
  }

  /** Pass the leg's station in one of its mounts and walk on in the next leg. */
  private station(mt: StationMount, leg: number, cmin: number, cadj: number, price: number, u: number): void {
    this.moves.push(stationMove(mt.station, mt.rev));
    this.visit[mt.exit]++;
    this.node(leg + 1, mt.exit, cmin + mt.len, cadj + mt.adj, price, u, -1);
    this.visit[mt.exit]--;
    this.moves.pop();
  }

  /**
   * Best-first among siblings: every viable child gets its relaxed ranking bound, children
   * are tried in bound order and skipped once they cannot beat the current last place.
   * Good chains are found first, so the bound bites early.
   */
  private ordered(leg: number, f: number, cmin: number, cadj: number, price: number, u: number, loopMin: number, kidTest: KidTest | null): void {
    const { p, s } = this;
    const m = p.model;
    const r = this.k - u;
    if (leg === p.S && r === 0 && f === p.camEntry) {
      const dMin = cmin + p.camLen;
      s.complete(dMin, dMin + cadj + p.camAdj, price, this.moves, this.used);
    }
    const raw: number[] = [];
    this.candidates(leg, f, cmin, cadj, r, loopMin, kidTest, (o) => raw.push(o));
    if (raw.length > tuning.sortLimit) {
      // Too many siblings to bound and sort each: walk them in length order instead.
      for (const o of raw) this.step(o, leg, f, cmin, cadj, price, u);
      if (leg < p.S) for (const mt of p.exits[leg]) if (mt.entry === f) this.station(mt, leg, cmin, cadj, price, u);
      return;
    }
    const kids: Kid[] = [];
    const consider = (move: number, kLeg: number, to: number, len: number, adj: number, cost: number, kU: number, loop: boolean) => {
      if (--p.work.left < 0) throw EXHAUSTED;
      const lt = p.loc[kLeg][to];
      if (lt < 0 || !this.viable(kLeg, lt, this.k - kU, cmin + len, cadj + adj)) return;
      const bound = s.order!.bound(kLeg, lt, this.k - kU, cmin + len, cadj + adj, price + cost);
      if (bound) kids.push({ move, leg: kLeg, to, len, adj, cost, u: kU, loop, ...bound });
    };
    for (const o of raw) consider(o, leg, m.oTo[o], m.oLen[o], m.oAdj[o], m.oPrice[o], u + 1, m.oTo[o] === f);
    if (leg < p.S) {
      for (const mt of p.exits[leg]) if (mt.entry === f) consider(stationMove(mt.station, mt.rev), leg + 1, mt.exit, mt.len, mt.adj, 0, u, false);
    }
    kids.sort((x, y) => x.err - y.err || cmpPrice(x.price, y.price) || x.d - y.d);
    for (const kid of kids) {
      const verdict = s.order!.verdict(kid);
      if (verdict === "stop") break;
      if (verdict === "skip") continue;
      // Stock was checked in candidates(): every sibling's walk puts back what it took.
      const part = kid.move >= 0 ? m.oPart[kid.move] : -1;
      if (part >= 0) this.used[part]++;
      this.moves.push(kid.move);
      const test = s.enter ? s.enter(kid.leg, p.loc[kid.leg][kid.to], this.k - kid.u, cmin + kid.len, cadj + kid.adj, this.moves) : true;
      if (test === false) {
        this.moves.pop();
        if (part >= 0) this.used[part]--;
        continue;
      }
      if (!kid.loop) this.visit[kid.to]++;
      this.tick();
      this.ordered(kid.leg, kid.to, cmin + kid.len, cadj + kid.adj, price + kid.cost, kid.u, kid.loop ? kid.move : -1, test === true ? null : test);
      if (!kid.loop) this.visit[kid.to]--;
      this.moves.pop();
      if (part >= 0) this.used[part]--;
    }
  }
}

type Kid = { move: number; leg: number; to: number; len: number; adj: number; cost: number; u: number; loop: boolean } & Bound;
