// Relaxed bounds on the rest of a chain, ignoring stock: for every leg, relevant face and
// exact number r of connecting parts still to place, the least length, the most length
// (adjustable parts fully out) and the least price of a way to finish at the camera, and
// when the load is judged its least weight (camera included; unknown weights count 0).
// Levels are filled on demand: a search that stops at 3 parts never pays for 10.

import type { Problem } from "./problem";
import { loadLimitG } from "./warnings";

/** A weight as the load warning counts it: unknown = 0. */
export const weightOf = (w: number | undefined): number => (typeof w === "number" ? w : 0);

export class Tables {
  readonly R: number;
  /** Per leg: [local face * (R + 1) + r]. Infinity (or -Infinity for maxLen) = impossible. */
  readonly minLen: Float64Array[];
  readonly maxLen: Float64Array[];
  readonly minPrice: Float64Array[];
  readonly minWeight: Float64Array[] | null;
  private built = -1;
  private atMost: Float64Array[] | null = null;

  constructor(private readonly p: Problem) {
    this.R = p.maxParts;
    const W = this.R + 1;
    this.minLen = p.rel.map((r) => new Float64Array(r.length * W).fill(Infinity));
    this.maxLen = p.rel.map((r) => new Float64Array(r.length * W).fill(-Infinity));
    this.minPrice = p.rel.map((r) => new Float64Array(r.length * W).fill(Infinity));
    this.minWeight = loadLimitG(p) === null ? null : p.rel.map((r) => new Float64Array(r.length * W).fill(Infinity));
  }

  /** Fill every level up to r parts. */
  ensure(r: number): void {
    const { p } = this;
    const { model: m, S, rel, loc, exits } = p;
    const W = this.R + 1;
    const modelF = m.faces.size;
    const { minLen, maxLen, minPrice, minWeight } = this;
    for (let k = this.built + 1; k <= Math.min(r, this.R); k++) {
      for (let leg = S; leg >= 0; leg--) {
        const faces = rel[leg], here = loc[leg];
        const mnL = minLen[leg], mxL = maxLen[leg], mnP = minPrice[leg], mnW = minWeight?.[leg];
        for (let li = 0; li < faces.length; li++) {
          const f = faces[li];
          let mn = Infinity, mx = -Infinity, mp = Infinity, mw = Infinity;
          if (k > 0 && f < modelF) {
            for (let g = m.faceOut[f]; g < m.faceOut[f + 1]; g++) {
              const lt = here[m.gTo[g]];
              if (lt < 0) continue;
              const j = lt * W + k - 1;
              const v = mnL[j];
              if (v === Infinity) continue;
              if (m.gMinLen[g] + v < mn) mn = m.gMinLen[g] + v;
              if (m.gMaxLenAdj[g] + mxL[j] > mx) mx = m.gMaxLenAdj[g] + mxL[j];
              if (m.gMinPrice[g] + mnP[j] < mp) mp = m.gMinPrice[g] + mnP[j];
              if (mnW && m.gMinWeight[g] + mnW[j] < mw) mw = m.gMinWeight[g] + mnW[j];
            }
          }
          if (leg < S) {
            for (const mt of exits[leg]) {
              if (mt.entry !== f) continue;
              const j = loc[leg + 1][mt.exit] * W + k;
              const v = minLen[leg + 1][j];
              if (v === Infinity) continue;
              if (mt.len + v < mn) mn = mt.len + v;
              if (mt.len + mt.adj + maxLen[leg + 1][j] > mx) mx = mt.len + mt.adj + maxLen[leg + 1][j];
              if (minPrice[leg + 1][j] < mp) mp = minPrice[leg + 1][j];
              if (minWeight) mw = Math.min(mw, weightOf(p.stations[mt.station].weightG) + minWeight[leg + 1][j]);
            }
          } else if (k === 0 && f === p.camEntry) {
            mn = p.camLen; mx = p.camLen + p.camAdj; mp = 0; mw = weightOf(p.req.camera.weightG);
          }
          const i = li * W + k;
          mnL[i] = mn; mxL[i] = mx; mnP[i] = mp;
          if (mnW) mnW[i] = mw;
        }
      }
      this.built = k;
    }
  }

  /** Least length with at most r parts, per leg: [local face * (R + 1) + r] (fills every level). */
  get minLenAtMost(): Float64Array[] {
    if (this.atMost) return this.atMost;
    this.ensure(this.R);
    const W = this.R + 1;
    this.atMost = this.minLen.map((arr) => {
      const out = new Float64Array(arr.length);
      for (let base = 0; base < arr.length; base += W) {
        let best = Infinity;
        for (let r = 0; r < W; r++) { best = Math.min(best, arr[base + r]); out[base + r] = best; }
      }
      return out;
    });
    return this.atMost;
  }
}

export function buildTables(p: Problem): Tables {
  return new Tables(p);
}
