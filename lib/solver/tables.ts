// Relaxed bounds on the rest of a chain, ignoring stock: for every leg, relevant face and
// exact number r of connecting parts still to place, the least length, the most length
// (adjustable parts fully out) and the least price of a way to finish at the camera.

import type { Problem } from "./problem";

export type Tables = {
  R: number;
  /** Per leg: [local face * (R + 1) + r]. Infinity (or -Infinity for maxLen) = impossible. */
  minLen: Float64Array[];
  maxLen: Float64Array[];
  minPrice: Float64Array[];
  /** Least length with at most r parts. */
  minLenAtMost: Float64Array[];
};

export function buildTables(p: Problem): Tables {
  const { model: m, S, rel, loc, exits } = p;
  const R = p.maxParts;
  const W = R + 1;
  const modelF = m.faces.size;
  const minLen = rel.map((r) => new Float64Array(r.length * W).fill(Infinity));
  const maxLen = rel.map((r) => new Float64Array(r.length * W).fill(-Infinity));
  const minPrice = rel.map((r) => new Float64Array(r.length * W).fill(Infinity));
  for (let r = 0; r <= R; r++) {
    for (let leg = S; leg >= 0; leg--) {
      const faces = rel[leg], here = loc[leg];
      const mnL = minLen[leg], mxL = maxLen[leg], mnP = minPrice[leg];
      for (let li = 0; li < faces.length; li++) {
        const f = faces[li];
        let mn = Infinity, mx = -Infinity, mp = Infinity;
        if (r > 0 && f < modelF) {
          for (let g = m.faceOut[f]; g < m.faceOut[f + 1]; g++) {
            const lt = here[m.gTo[g]];
            if (lt < 0) continue;
            const j = lt * W + r - 1;
            const v = mnL[j];
            if (v === Infinity) continue;
            if (m.gMinLen[g] + v < mn) mn = m.gMinLen[g] + v;
            if (m.gMaxLenAdj[g] + mxL[j] > mx) mx = m.gMaxLenAdj[g] + mxL[j];
            if (m.gMinPrice[g] + mnP[j] < mp) mp = m.gMinPrice[g] + mnP[j];
          }
        }
        if (leg < S) {
          for (const mt of exits[leg]) {
            if (mt.entry !== f) continue;
            const j = loc[leg + 1][mt.exit] * W + r;
            const v = minLen[leg + 1][j];
            if (v === Infinity) continue;
            if (mt.len + v < mn) mn = mt.len + v;
            if (mt.len + mt.adj + maxLen[leg + 1][j] > mx) mx = mt.len + mt.adj + maxLen[leg + 1][j];
            if (minPrice[leg + 1][j] < mp) mp = minPrice[leg + 1][j];
          }
        } else if (r === 0 && f === p.camEntry) {
          mn = p.camLen; mx = p.camLen + p.camAdj; mp = 0;
        }
        const i = li * W + r;
        mnL[i] = mn; mxL[i] = mx; mnP[i] = mp;
      }
    }
  }
  const minLenAtMost = minLen.map((arr) => {
    const out = new Float64Array(arr.length);
    for (let base = 0; base < arr.length; base += W) {
      let best = Infinity;
      for (let r = 0; r < W; r++) { best = Math.min(best, arr[base + r]); out[base + r] = best; }
    }
    return out;
  });
  return { R, minLen, maxLen, minPrice, minLenAtMost };
}
