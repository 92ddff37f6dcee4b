// The v2 ranking key's comparisons and the bounded list of the best geometries: each held by
// its best multiset so far. Key: warned, parts, detours, |error|, price (unknown last), D,
// then the multiset key so that ties come out the same every time.

import type { Ordered } from "./orderings";
import type { Bound } from "./walker";

/** Lengths that differ by less than this are equal for ranking (float noise of sums). */
export const RANK_EPS = 1e-9;

export const cmpLen = (a: number, b: number): number => (Math.abs(a - b) <= RANK_EPS ? 0 : a < b ? -1 : 1);
/** Prices in cents, Infinity when unknown (so unknown ranks last). */
export const cmpPrice = (a: number, b: number): number => (a === b ? 0 : a < b ? -1 : 1);

export type Entry = {
  warned: boolean; k: number; detours: number; err: number; price: number; d: number;
  msKey: string; geoKey: string; counts: Map<number, number>; ord: Ordered;
};

export function cmpEntry(a: Entry, b: Entry): number {
  return (a.warned === b.warned ? 0 : a.warned ? 1 : -1) || a.k - b.k || a.detours - b.detours ||
    cmpLen(a.err, b.err) || cmpPrice(a.price, b.price) || cmpLen(a.d, b.d) ||
    (a.msKey < b.msKey ? -1 : a.msKey > b.msKey ? 1 : 0);
}

/** A relaxed bound (detours taken as 0) against an entry of the same phase and level. */
export function cmpBound(b: Bound, worst: Entry): number {
  if (worst.detours > 0) return -1;
  return cmpLen(b.err, worst.err) || cmpPrice(b.price, worst.price) || cmpLen(b.d, worst.d);
}

/** The best `capacity` geometries, each held by its best multiset so far. */
export class GeoTop {
  readonly items: Entry[] = [];
  private readonly byGeo = new Map<string, Entry>();
  constructor(readonly capacity: number) {}
  get full(): boolean { return this.items.length >= this.capacity; }
  get worst(): Entry | undefined { return this.items[this.items.length - 1]; }
  offer(e: Entry): void {
    const prev = this.byGeo.get(e.geoKey);
    if (prev) {
      if (cmpEntry(e, prev) >= 0) return;
      this.items.splice(this.items.indexOf(prev), 1);
    } else if (this.full && cmpEntry(e, this.worst!) >= 0) return;
    let i = this.items.length;
    while (i > 0 && cmpEntry(e, this.items[i - 1]) < 0) i--;
    this.items.splice(i, 0, e);
    this.byGeo.set(e.geoKey, e);
    if (this.items.length > this.capacity) this.byGeo.delete(this.items.pop()!.geoKey);
  }
}
