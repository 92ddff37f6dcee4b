// The scalar relaxation behind clean.ts, cheap enough to fill on every level of phase one:
// per leg, relevant face and exact number of connecting parts left (stock ignored), the least
// and most length a clean way to finish can add. (The least weight is in tables.ts.)

import type { Problem } from "./problem";
import type { Limits } from "./reach";

/** Slack on a limit before it prunes: float noise must never turn a clean chain away. */
export const LIMIT_SLACK = 1e-7;

/**
 * The scalar form of the same relaxation, cheap enough to fill on every level: per leg,
 * relevant face and exact parts left, the least and (an upper bound on) the most length a
 * clean way to finish can add (stock ignored; -Infinity/Infinity order = none).
 */
export class CleanSpan {
  private readonly W: number;
  readonly min: Float64Array[];
  readonly max: Float64Array[];
  private built = -1;
  /**
   * Per group g, entries [start[g], start[g + 1]): the orientations that are shortest for
   * their room (length, limit − length, both growing), and top[g], its largest limit.
   */
  private front: { start: Int32Array; lens: Float64Array; slack: Float64Array; top: Float64Array } | null = null;

  constructor(private readonly p: Problem, private readonly limits: Limits) {
    this.W = p.maxParts + 1;
    this.min = p.rel.map((r) => new Float64Array(r.length * this.W).fill(Infinity));
    this.max = p.rel.map((r) => new Float64Array(r.length * this.W).fill(-Infinity));
  }

  private frontier() {
    if (this.front) return this.front;
    const m = this.p.model, G = m.gFrom.length;
    const start = new Int32Array(G + 1), lens = new Float64Array(m.oLen.length), slack = new Float64Array(m.oLen.length);
    const top = new Float64Array(G).fill(-Infinity);
    let n = 0;
    for (let g = 0; g < G; g++) {
      start[g] = n;
      for (let o = m.gStart[g]; o < m.gEnd[g]; o++) { // by length
        const limit = this.limits.orient(o), room = limit - m.oLen[o];
        if (limit > top[g]) top[g] = limit;
        if (n === start[g] || room > slack[n - 1]) { lens[n] = m.oLen[o]; slack[n] = room; n++; }
      }
    }
    start[G] = n;
    this.front = { start, lens, slack, top };
    return this.front;
  }

  ensure(r: number): void {
    const { p, W } = this;
    const m = p.model, modelF = m.faces.size;
    const fr = this.frontier();
    for (let k = this.built + 1; k <= Math.min(r, p.maxParts); k++) {
      for (let leg = p.S; leg >= 0; leg--) {
        const faces = p.rel[leg], here = p.loc[leg], mn = this.min[leg], mx = this.max[leg];
        for (let li = 0; li < faces.length; li++) {
          const f = faces[li];
          let lo = Infinity, hi = -Infinity;
          if (k > 0 && f < modelF) {
            for (let g = m.faceOut[f]; g < m.faceOut[f + 1]; g++) {
              const lt = here[m.gTo[g]];
              if (lt < 0) continue;
              const y = mn[lt * W + k - 1];
              if (y === Infinity) continue;
              let i = fr.start[g];
              while (i < fr.start[g + 1] && fr.slack[i] < y - LIMIT_SLACK) i++;
              if (i === fr.start[g + 1]) continue;
              lo = Math.min(lo, fr.lens[i] + y);
              hi = Math.max(hi, Math.min(fr.top[g], m.gMaxLenAdj[g] + mx[lt * W + k - 1]));
            }
          }
          if (leg < p.S) {
            for (const mt of p.exits[leg]) {
              if (mt.entry !== f) continue;
              const j = p.loc[leg + 1][mt.exit] * W + k, y = this.min[leg + 1][j], limit = this.limits.mount(mt);
              if (y === Infinity || mt.len + y > limit + LIMIT_SLACK) continue;
              lo = Math.min(lo, mt.len + y);
              hi = Math.max(hi, Math.min(limit, mt.len + mt.adj + this.max[leg + 1][j]));
            }
          } else if (k === 0 && f === p.camEntry && p.camLen <= this.limits.camera + LIMIT_SLACK) {
            lo = p.camLen;
            hi = Math.min(this.limits.camera, p.camLen + p.camAdj);
          }
          mn[li * W + k] = lo;
          mx[li * W + k] = hi;
        }
      }
      this.built = k;
    }
  }
}
