// Geometry classes (contract v2 §3): connecting parts with the same front port, rear port,
// lengthMm and adjustMm are equivalent; a multiset's geometry is its multiset of classes.
// Built once per model (so once per parts array), with every part's orientations.

import type { Model } from "./model";
import { cmpPrice } from "./topk";
import type { Part } from "./types";

export type Classes = {
  /** Per part index: its class, -1 when the part is not a usable connector. */
  classOf: Int32Array;
  /** Per class: its usable members, cheapest first (unknown price last), then by index. */
  members: number[][];
  /** Per part index: its orientation indices in the model. */
  orients: number[][];
};

const portKey = (p: Part["front"]) => (p ? `${p.interface}\u0001${p.gender}` : "-");
export const geometryKeyOf = (p: Part) => `${portKey(p.front)}\u0002${portKey(p.rear)}\u0002${p.lengthMm}\u0002${Math.max(0, p.adjustMm ?? 0)}`;

const cache = new WeakMap<Model, Classes>();

export function getClasses(m: Model): Classes {
  const hit = cache.get(m);
  if (hit) return hit;
  const n = m.parts.length;
  const orients: number[][] = Array.from({ length: n }, () => []);
  for (let o = 0; o < m.oPart.length; o++) orients[m.oPart[o]].push(o);
  const classOf = new Int32Array(n).fill(-1);
  const byKey = new Map<string, number>();
  const members: number[][] = [];
  for (let i = 0; i < n; i++) {
    if (orients[i].length === 0) continue;
    const key = geometryKeyOf(m.parts[i]);
    let c = byKey.get(key);
    if (c === undefined) { c = members.length; byKey.set(key, c); members.push([]); }
    classOf[i] = c;
    members[c].push(i);
  }
  const price = (i: number) => m.parts[i].priceCents ?? Infinity;
  for (const list of members) list.sort((a, b) => cmpPrice(price(a), price(b)) || a - b);
  const out = { classOf, members, orients };
  cache.set(m, out);
  return out;
}
