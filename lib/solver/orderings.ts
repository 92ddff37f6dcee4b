// One multiset of connecting parts, every way round: all the orderings and orientations in
// which it makes a full chain (stations in order, camera last), and the best of them by the
// v2 key's ordering-dependent part (warned, then detours). Multisets are small (maxParts),
// and only the mating orderings are walked.

import { materialize } from "./chain";
import { getClasses } from "./classes";
import type { Problem } from "./problem";
import { stationMove } from "./moves";
import type { Chain } from "./types";

export type Ordered = { moves: number[]; chain: Chain; warned: boolean; detours: number };

/** Vignetting or load (image-circle warnings are the same for every chain and do not count). */
export const isWarned = (chain: Chain): boolean => chain.warnings.some((w) => w.code === "vignetting" || w.code === "load");

export function dress(p: Problem, moves: readonly number[]): Ordered {
  const chain = materialize(p, moves, "target");
  return { moves: moves.slice(), chain, warned: isWarned(chain), detours: chain.detours };
}

export function better(a: Ordered, b: Ordered): boolean {
  return a.warned !== b.warned ? !a.warned : a.detours < b.detours;
}

/** Thrown when the request's work budget runs out (see WORK_LIMIT). */
export const OUT_OF_WORK = Symbol("out of work");

export function spend(p: Problem, n = 1): void {
  p.work.left -= n;
  if (p.work.left < 0) { p.work.exhausted = true; throw OUT_OF_WORK; }
}

/**
 * The best ordering of the multiset `counts` (part index → uses), or null when no ordering
 * mates. `stopEarly`: return the first unwarned, detour-free ordering found (it cannot be beaten).
 */
export function bestOrdering(p: Problem, counts: ReadonlyMap<number, number>): Ordered | null {
  const m = p.model;
  const { orients } = getClasses(m);
  const rem = new Map(counts);
  const list = [...counts.keys()];
  let left = 0;
  for (const c of counts.values()) left += c;
  const moves: number[] = [];
  let best: Ordered | null = null;
  let done = false;

  const rec = (leg: number, f: number): void => {
    if (done) return;
    spend(p);
    if (leg === p.S) {
      if (left === 0 && f === p.camEntry) {
        const o = dress(p, moves);
        if (!best || better(o, best)) best = o;
        if (!best.warned && best.detours === 0) done = true;
      }
    } else {
      for (const mt of p.mounts[leg]) {
        if (mt.entry !== f) continue;
        moves.push(stationMove(mt.station, mt.rev));
        rec(leg + 1, mt.exit);
        moves.pop();
      }
    }
    if (left === 0) return;
    for (const part of list) {
      const c = rem.get(part)!;
      if (c === 0) continue;
      for (const o of orients[part]) {
        if (m.oFrom[o] !== f) continue;
        rem.set(part, c - 1); left--; moves.push(o);
        rec(leg, m.oTo[o]);
        moves.pop(); left++; rem.set(part, c);
      }
    }
  };
  if (p.start >= 0) rec(0, p.start);
  return best;
}

/**
 * Contract v2 §4 (no back focus): a multiset is no solution when it contains every part of
 * a better-ranked one. A proper sub-multiset has fewer parts, so it ranks better unless it is
 * warned and this one is not.
 */
export function containsBetter(p: Problem, counts: ReadonlyMap<number, number>, warned: boolean): boolean {
  const parts = [...counts.keys()];
  const take = new Map<number, number>();
  let total = 0, full = 0;
  for (const c of counts.values()) full += c;
  let found = false;
  const rec = (i: number): void => {
    if (found) return;
    if (i === parts.length) {
      if (total === full) return;
      const o = bestOrdering(p, take);
      if (o && (warned || !o.warned)) found = true;
      return;
    }
    const part = parts[i];
    for (let c = 0; c <= counts.get(part)!; c++) {
      if (c > 0) take.set(part, c); else take.delete(part);
      total += c;
      rec(i + 1);
      total -= c;
    }
    take.delete(part);
  };
  rec(0);
  return found;
}
