// Which lengths the rest of a chain can still add, as bitsets over length buckets, per leg,
// relevant face and exact number of connecting parts left — ignoring stock, so a superset
// of the truth: it may keep a hopeless branch but never drops a feasible one.
//
// Two encodings. "Grid": every length is a multiple of a grain g (0.1 mm, say); bit 2j is
// the length j·g exactly and bit 2j+1 the open gap between j·g and (j+1)·g, so a sum of
// adjustable ranges stays exact. "Coarse": bucket b = floor(length / w); a path of n items
// whose buckets add to B has a true length in [w·B, w·(B + n)); we widen that to
// [w·(B − n − 1), w·(B + 2n + 2)) so that float rounding of a bucket can never cut it.
//
// With limits (clean.ts), an item may only stand where the length to go from its front to
// the sensor is at most its limit (the farthest it clears the beam): after an item is added,
// every bucket whose least possible length is above the limit is cleared. A bucket is kept
// when any length in it might pass, so the filter never drops a feasible finish.

import { type Bits, clearAbove, firstSetIn, forEachBit, isEmpty, lastSetIn, orInto, orShift, orShiftRange, popcount, setRange } from "./bitset";
import { isMultiple } from "./model";
import type { Problem, StationMount } from "./problem";

/** The farthest from the sensor (mm, front of the item to the sensor) each item may stand; Infinity = anywhere. */
export type Limits = {
  /** Per model orientation. */
  orient(o: number): number;
  mount(mt: StationMount): number;
  camera: number;
};

/** A group's orientations that share one limit, as merged bit ranges. */
type Band = { limit: number; ranges: Int32Array };

const MAX_GRID_BITS = 8192;
const COARSE_BITS = 2048;

export class Reach {
  readonly grid: boolean;
  readonly step: number;
  readonly nb: number;
  private readonly words: number;
  private readonly bits: (Bits | null)[][][] = []; // [leg][r][local face]
  private readonly pops: Int32Array[][] = [];
  private readonly groupRanges = new Map<number, Int32Array>();
  private readonly groupBands = new Map<number, Band[]>();
  private readonly rangeBits = new Map<Int32Array, Bits>();
  private readonly tmp: Bits;
  private readonly capped: Bits;
  private built = -1;
  /** Highest level (parts left) with bitsets; beyond it queries answer "maybe". */
  get level(): number {
    return this.built;
  }
  /** Padding on every query: grid sums are exact to float noise, coarse ones are padded anyway. */
  private readonly eps: number;

  constructor(private readonly p: Problem, readonly capMm: number, grain: number | null, private readonly limits: Limits | null = null) {
    this.grid = grain !== null && (2 * capMm) / grain <= MAX_GRID_BITS;
    this.step = this.grid ? grain! : Math.max(capMm / COARSE_BITS, 1e-4);
    this.nb = this.grid ? 2 * Math.ceil(capMm / grain! + 1e-9) + 2 : Math.floor(capMm / this.step) + 2;
    this.words = (this.nb + 31) >>> 5;
    this.tmp = new Uint32Array(this.words);
    this.capped = new Uint32Array(this.words);
    this.eps = this.grid ? 1e-8 : 1e-7;
    for (let leg = 0; leg <= p.S; leg++) { this.bits.push([]); this.pops.push([]); }
  }

  private bitOf(mm: number): number {
    return this.grid ? 2 * Math.round(mm / this.step) : Math.floor(mm / this.step);
  }

  /** Merged bit ranges [lo, hi] of these orientations (in length order) of one group. */
  private rangesOfOrients(orients: Iterable<number>): Int32Array {
    const m = this.p.model;
    const out: number[] = [];
    for (const o of orients) {
      const lo = this.bitOf(m.oLen[o]);
      if (lo >= this.nb) break; // sorted by length: the rest are longer still
      const hi = Math.min(this.nb - 1, this.bitOf(m.oLen[o] + m.oAdj[o]));
      const n = out.length;
      if (n && lo <= out[n - 1] + 1) out[n - 1] = Math.max(out[n - 1], hi);
      else out.push(lo, hi);
    }
    return Int32Array.from(out);
  }

  private rangesOf(g: number): Int32Array {
    let r = this.groupRanges.get(g);
    if (!r) {
      const m = this.p.model;
      const orients = function* () { for (let o = m.gStart[g]; o < m.gEnd[g]; o++) yield o; };
      r = this.rangesOfOrients(orients());
      this.groupRanges.set(g, r);
    }
    return r;
  }

  /**
   * A group's orientations by limit, least first; every limit too far to ever clear a bucket
   * (even for a lone camera) is folded into one unlimited band.
   */
  private bandsOf(g: number): Band[] {
    let bands = this.groupBands.get(g);
    if (bands) return bands;
    const m = this.p.model, limits = this.limits!;
    const byLimit = new Map<number, number[]>();
    for (let o = m.gStart[g]; o < m.gEnd[g]; o++) {
      const own = limits.orient(o);
      const l = this.topBit(own, 1) >= this.nb - 1 ? Infinity : own;
      let list = byLimit.get(l);
      if (!list) byLimit.set(l, (list = []));
      list.push(o);
    }
    bands = [...byLimit].sort((a, b) => a[0] - b[0]).map(([l, orients]) => ({ limit: l, ranges: this.rangesOfOrients(orients) }));
    this.groupBands.set(g, bands);
    return bands;
  }

  /**
   * The highest bit that may hold a length to go of at most `limit` mm, for n items: the
   * lowest length a bucket can stand for is its least (grid: exact, coarse: widened by n + 1).
   */
  private topBit(limit: number, n: number): number {
    if (limit === Infinity) return this.nb - 1;
    const l = limit + this.eps;
    const top = this.grid ? 2 * Math.floor(l / this.step) + 1 : Math.floor(l / this.step) + n + 1;
    return Math.min(this.nb - 1, top);
  }

  private convolve(dst: Bits, src: Bits, srcPop: number, ranges: Int32Array): void {
    const count = ranges.length >> 1;
    if (count <= 2 || count <= srcPop) {
      for (let i = 0; i < ranges.length; i += 2) orShiftRange(dst, src, ranges[i], ranges[i + 1] - ranges[i], this.tmp);
      return;
    }
    let offsets = this.rangeBits.get(ranges);
    if (!offsets) {
      offsets = new Uint32Array(this.words);
      for (let i = 0; i < ranges.length; i += 2) setRange(offsets, ranges[i], ranges[i + 1]);
      this.rangeBits.set(ranges, offsets);
    }
    const lg = offsets;
    forEachBit(src, (b) => orShift(dst, lg, b));
  }

  /** dst |= (src shifted by the ranges), keeping only bits up to `top`. */
  private convolveUpTo(dst: Bits, src: Bits, srcPop: number, ranges: Int32Array, top: number): void {
    if (top < 0 || ranges.length === 0 || ranges[0] > top) return;
    if (top >= this.nb - 1) { this.convolve(dst, src, srcPop, ranges); return; }
    this.capped.fill(0);
    this.convolve(this.capped, src, srcPop, ranges);
    clearAbove(this.capped, top);
    orInto(dst, this.capped);
  }

  /** Make sure bitsets exist for every r up to `r`. */
  ensure(r: number): void {
    const { p } = this;
    r = Math.min(r, this.p.maxParts);
    const m = p.model, modelF = m.faces.size;
    for (let k = this.built + 1; k <= r; k++) {
      for (let leg = p.S; leg >= 0; leg--) {
        const faces = p.rel[leg], here = p.loc[leg];
        const row: (Bits | null)[] = new Array(faces.length).fill(null);
        const pops = new Int32Array(faces.length);
        for (let li = 0; li < faces.length; li++) {
          const f = faces[li];
          let acc: Bits | null = null;
          if (k > 0 && f < modelF) {
            const prev = this.bits[leg][k - 1], prevPop = this.pops[leg][k - 1];
            const n = this.items(leg, k);
            for (let g = m.faceOut[f]; g < m.faceOut[f + 1]; g++) {
              const lt = here[m.gTo[g]];
              if (lt < 0 || !prev[lt]) continue;
              acc ??= new Uint32Array(this.words);
              if (!this.limits) this.convolve(acc, prev[lt]!, prevPop[lt], this.rangesOf(g));
              else for (const band of this.bandsOf(g)) this.convolveUpTo(acc, prev[lt]!, prevPop[lt], band.ranges, this.topBit(band.limit, n));
            }
          }
          if (leg < p.S) {
            for (const mt of p.exits[leg]) {
              if (mt.entry !== f) continue;
              const src = this.bits[leg + 1][k][p.loc[leg + 1][mt.exit]];
              if (!src) continue;
              const lo = this.bitOf(mt.len);
              if (lo >= this.nb) continue;
              acc ??= new Uint32Array(this.words);
              const range = Int32Array.of(lo, Math.min(this.nb - 1, this.bitOf(mt.len + mt.adj)));
              this.convolveUpTo(acc, src, Infinity, range, this.limits ? this.topBit(this.limits.mount(mt), this.items(leg, k)) : this.nb - 1);
            }
          } else if (k === 0 && f === p.camEntry) {
            acc = new Uint32Array(this.words);
            const top = this.limits ? this.topBit(this.limits.camera, 1) : this.nb - 1;
            setRange(acc, this.bitOf(p.camLen), Math.min(top, this.bitOf(p.camLen + p.camAdj)));
          }
          if (acc && !isEmpty(acc)) { row[li] = acc; pops[li] = popcount(acc); }
        }
        this.bits[leg][k] = row;
        this.pops[leg][k] = pops;
      }
      this.built = k;
    }
  }

  /** Bit range whose buckets can hold a length in [qlo, qhi], for n items still to add. */
  private span(qlo: number, qhi: number, n: number): [number, number] {
    if (this.grid) {
      const u = (qlo - this.eps) / this.step, v = (qhi + this.eps) / this.step;
      const a = Math.floor(u), b = Math.floor(v);
      return [u - a <= 1e-9 ? 2 * a : 2 * a + 1, v - b <= 1e-9 ? 2 * b : 2 * b + 1];
    }
    return [Math.floor(qlo / this.step) - 2 * n - 2, Math.floor(qhi / this.step) + n + 1];
  }

  private supOf(b: number, n: number): number {
    if (this.grid) return ((b + (b & 1)) / 2) * this.step;
    return (b + 2 * n + 2) * this.step;
  }

  private infOf(b: number, n: number): number {
    if (this.grid) return ((b - (b & 1)) / 2) * this.step;
    return (b - n - 1) * this.step;
  }

  /** Items a finish from this leg still holds besides r connectors: stations left + camera. */
  private items(leg: number, r: number): number {
    return r + (this.p.S - leg) + 1;
  }

  has(leg: number, li: number, r: number): boolean {
    return !!this.bits[leg][r]?.[li];
  }

  /** Can the rest add a length in [qlo, qhi]? */
  any(leg: number, li: number, r: number, qlo: number, qhi: number): boolean {
    if (r > this.built) return true;
    const bits = this.bits[leg][r]?.[li];
    if (!bits || qhi < qlo - this.eps) return false;
    const [a, b] = this.span(qlo, qhi, this.items(leg, r));
    return firstSetIn(bits, a, Math.min(b, this.nb - 1)) >= 0;
  }

  /** Least distance from anything the rest can add to [qlo, qhi] (a lower bound). */
  distance(leg: number, li: number, r: number, qlo: number, qhi: number): number {
    if (r > this.built) return 0;
    const bits = this.bits[leg][r]?.[li];
    if (!bits) return Infinity;
    const n = this.items(leg, r);
    const [a, b] = this.span(qlo, qhi, n);
    if (firstSetIn(bits, a, Math.min(b, this.nb - 1)) >= 0) return 0;
    let best = Infinity;
    const below = lastSetIn(bits, 0, a - 1);
    if (below >= 0) best = Math.min(best, qlo - this.supOf(below, n));
    const above = firstSetIn(bits, b + 1, this.nb - 1);
    if (above >= 0) best = Math.min(best, this.infOf(above, n) - qhi);
    return Math.max(0, best - 2 * this.eps);
  }
}

/** The grain shared by the catalog and this request's stations and camera, if any. */
export function requestGrain(p: Problem): number | null {
  let g = p.model.grainMm;
  if (g === null) return null;
  const extra = [p.camLen, p.camAdj];
  for (const list of p.mounts) for (const mt of list) extra.push(mt.len, mt.adj);
  const candidates = [1, 0.5, 0.25, 0.2, 0.1, 0.05, 0.02, 0.01].filter((c) => c <= g!);
  for (const c of candidates) {
    if (extra.every((v) => isMultiple(v, c)) && isMultiple(g, c)) return c;
  }
  return null;
}
