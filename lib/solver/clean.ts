// Phase one of the window search takes only clean chains: no vignetting and no load warning.
// This module says, never wrongly, when no clean chain can pass through a search state, so
// that phase one proves "there is none" without walking the window's warned chains:
//
// - vignetting: an item of clear aperture c clears the beam only while the length to go from
//   its front to the sensor is at most (c − diagonal)·N (lib/optics). What a clean rest of the
//   chain can add — per leg, face and parts left: its least and most length (clean-tables.ts,
//   every level) and, once a walk proves expensive, the lengths themselves as bitsets (reach.ts
//   built with those limits) — must allow a length that lands the chain in the window and
//   leaves every item already placed within its own limit;
// - load: the weight so far plus the least weight of any way to finish must stay within the
//   optics' rating.
//
// Same-face spacers are left unlimited: the walk puts them at a face's first arrival, but a
// multiset's best ordering may move them nearer the sensor. Moving them there only moves the
// other items nearer the sensor too (their length to go shrinks, adjustable settings
// included), so the limits on every other item still hold for the walked ordering. Only a
// spacer too narrow even right in front of the camera (its own length plus the camera's)
// is left out: it warns in every ordering.

import { farthestUnvignettedMm } from "../optics";
import { CleanSpan, LIMIT_SLACK } from "./clean-tables";
import { decodeStationMove } from "./moves";
import type { Model } from "./model";
import type { Problem, StationMount } from "./problem";
import { type Limits, Reach, requestGrain } from "./reach";
import { type Tables, weightOf } from "./tables";
import type { KidTest } from "./walker";
import { loadLimitG, vignettingInputs } from "./warnings";

/** Can any chain of this request be warned at all? (Otherwise phase two has nothing to find.) */
export function warningsPossible(p: Problem): boolean {
  return vignettingInputs(p) !== null || loadLimitG(p) !== null;
}

/** True when every chain is warned: the camera's own opening, the optics' rear, a station, or the fixed load. */
export function everyChainWarned(p: Problem): boolean {
  const { optics, camera } = p.req;
  const vig = vignettingInputs(p);
  if (vig) {
    const far = (ca: number | undefined) => farthest(ca, vig.N, vig.s);
    if (far(camera.clearApertureMm) < p.camLen - LIMIT_SLACK) return true;
    if (far(optics.clearApertureMm) < Math.max(0, p.lo) - LIMIT_SLACK) return true;
    // A station is at least its own length, the later stations' and the camera's from the sensor.
    let tail = p.camLen;
    for (let j = p.stations.length - 1; j >= 0; j--) {
      tail += p.stations[j].lengthMm;
      if (far(p.stations[j].clearApertureMm) < tail - LIMIT_SLACK) return true;
    }
  }
  const maxLoad = loadLimitG(p);
  const fixed = [...p.stations, camera];
  if (maxLoad !== null && fixed.every((x) => (x.weightG ?? 0) >= 0) && p.model.weight.every((w) => w >= 0)) {
    if (fixed.reduce((w, x) => w + (x.weightG ?? 0), 0) > maxLoad + 1e-9) return true;
  }
  return false;
}

/**
 * The farthest from the sensor an item of clear aperture `ca` may stand without a vignetting
 * warning (the warning's own 1e-9 mm slack included); Infinity when it has no aperture.
 */
function farthest(ca: number | undefined, N: number, s: number): number {
  return typeof ca === "number" && Number.isFinite(ca) ? farthestUnvignettedMm(ca + 1e-9, s, N) : Infinity;
}

/** Per part: the farthest it may stand from the sensor (Infinity without vignetting inputs or an aperture). */
function partLimits(m: Model, vig: { N: number; s: number } | null): Float64Array {
  const out = new Float64Array(m.aperture.length).fill(Infinity);
  if (!vig) return out;
  for (let i = 0; i < out.length; i++) {
    const ca = m.aperture[i];
    if (Number.isFinite(ca)) out[i] = farthestUnvignettedMm(ca + 1e-9, vig.s, vig.N);
  }
  return out;
}

export type CleanPruner = {
  /** Fill the scalar tables for every level up to k parts (call before walking level k). */
  ensure(k: number): void;
  /** The length bitsets, built only when a walk proves expensive (see Walker.run). */
  sharpen: { level(): number; ensure(k: number): void };
  /**
   * False when no clean chain in the window (need [a, b]) can pass through this state;
   * otherwise the same test for each connector that may follow it.
   */
  enter(leg: number, li: number, r: number, cmin: number, cadj: number, moves: readonly number[]): KidTest | false;
};

/** The pruner for phase one, or null when neither vignetting nor load is judged. */
export function cleanPruner(p: Problem, t: Tables, need: { a: number; b: number }): CleanPruner | null {
  const vig = vignettingInputs(p);
  let maxLoad = loadLimitG(p);
  const fixedWeights = [...p.stations, p.req.camera].map((x) => weightOf(x.weightG));
  if (!p.model.weight.every(Number.isFinite) || !fixedWeights.every(Number.isFinite)) maxLoad = null; // a NaN total never warns
  if (!vig && maxLoad === null) return null;
  const m = p.model, W = t.R + 1;

  const far = (ca: number | undefined) => (vig ? farthest(ca, vig.N, vig.s) : Infinity);
  let partLimit: Float64Array | null = null; // filled on first use: many requests never walk phase one
  const limits: Limits = {
    orient: (o) => {
      partLimit ??= partLimits(m, vig);
      const limit = partLimit[m.oPart[o]];
      if (m.oFrom[o] !== m.oTo[o]) return limit;
      return limit < m.oLen[o] + p.camLen - LIMIT_SLACK ? -Infinity : Infinity;
    },
    mount: (mt: StationMount) => far(p.stations[mt.station].clearApertureMm),
    camera: far(p.req.camera.clearApertureMm),
  };
  const opticsLimit = far(p.req.optics.clearApertureMm);
  const reach = vig && p.target !== null ? new Reach(p, p.hi, requestGrain(p), limits) : null;
  const span = vig ? new CleanSpan(p, limits) : null;
  const least = maxLoad !== null ? t.minWeight : null; // filled by the walker with the other tables
  const stationOf = (mv: number) => p.stations[decodeStationMove(mv).station];

  /**
   * Can a clean chain finish from (leg, li, r) with the chain so far weighing `weight`,
   * its least length so far `cmin` (+ `cadj` adjustable), when the rest may add at most `room`?
   */
  const open = (leg: number, li: number, r: number, cmin: number, cadj: number, weight: number, room: number): boolean => {
    const ti = li * W + r;
    if (least && weight + least[leg][ti] > maxLoad! + 1e-9) return false;
    if (!span) return true;
    const qlo = need.a - cmin - cadj, qhi = Math.min(need.b - cmin, room) + LIMIT_SLACK;
    if (span.min[leg][ti] > qhi || span.max[leg][ti] < qlo - LIMIT_SLACK) return false;
    return !reach || reach.any(leg, li, r, qlo, qhi);
  };

  return {
    ensure(k) {
      span?.ensure(k);
    },
    sharpen: { level: () => (reach ? reach.level : Infinity), ensure: (k) => reach?.ensure(k) },
    enter(leg, li, r, cmin, cadj, moves) {
      if (li < 0) return () => true;
      const restMin = t.minLen[leg][li * W + r];
      if (restMin === Infinity) return () => true;
      let weight = 0;
      if (least) for (const mv of moves) weight += mv >= 0 ? m.weight[m.oPart[mv]] : weightOf(stationOf(mv).weightG);
      // Walking back from the last item placed: its length to go is at least its own and all
      // later least lengths (`tail`), and at least lo minus the most its start can be. The rest
      // of the chain may add at most `room` before some placed item passes its limit.
      let room = opticsLimit - cmin;
      let startMax = 0;
      if (vig) {
        let tail = restMin, placed = 0;
        for (const mv of moves) startMax += mv >= 0 ? m.oLen[mv] + m.oAdj[mv] : stationSpan(p, mv);
        for (let i = moves.length - 1; i >= 0; i--) {
          const mv = moves[i];
          const len = mv >= 0 ? m.oLen[mv] : stationOf(mv).lengthMm;
          tail += len;
          placed += len;
          startMax -= mv >= 0 ? m.oLen[mv] + m.oAdj[mv] : stationSpan(p, mv);
          const limit = mv >= 0 ? limits.orient(mv) : far(stationOf(mv).clearApertureMm);
          if (limit === Infinity) continue;
          if (limit < Math.max(0, tail, p.lo - startMax) - LIMIT_SLACK) return false;
          room = Math.min(room, limit - placed);
        }
        for (const mv of moves) startMax += mv >= 0 ? m.oLen[mv] + m.oAdj[mv] : stationSpan(p, mv);
      }
      if (!open(leg, li, r, cmin, cadj, weight, room)) return false;
      // The same for a connector placed next: its own limit, then the state it leads to.
      const here = p.loc[leg];
      return (o) => {
        const lt = here[m.oTo[o]];
        if (lt < 0) return true;
        const len = m.oLen[o], limit = limits.orient(o);
        if (limit !== Infinity) {
          const restAfter = t.minLen[leg][lt * W + r - 1];
          if (limit < Math.max(0, len + restAfter, p.lo - startMax) - LIMIT_SLACK) return false;
        }
        const w = least ? weight + m.weight[m.oPart[o]] : 0;
        return open(leg, lt, r - 1, cmin + len, cadj + m.oAdj[o], w, Math.min(room, limit) - len);
      };
    },
  };
}

function stationSpan(p: Problem, mv: number): number {
  const st = p.stations[decodeStationMove(mv).station];
  return st.lengthMm + Math.max(0, st.adjustMm ?? 0);
}
