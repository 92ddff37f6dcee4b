// The catalog model: every usable orientation of every connecting part, as an edge between
// open faces, sorted and grouped by (from, to). Built once per parts array and cached.

import type DirectedGraphType from "graphology";
import { FaceTable, turnsAround } from "./faces";
import { buildFaceGraph } from "./graph";
import { cmpPrice } from "./topk";
import type { Part } from "./types";

export type Model = {
  parts: readonly Part[];
  faces: FaceTable;
  /** Per part: most uses in one chain (Infinity = unlimited). */
  quantity: Float64Array;
  /** Per part: clearApertureMm, NaN when it has none (it never vignettes). */
  aperture: Float64Array;
  /** Per part: weightG, 0 when unknown (as the load warning counts it). */
  weight: Float64Array;
  // Orientations, sorted by (from, to, length, price, part).
  oPart: Int32Array;
  oRev: Uint8Array;
  oFrom: Int32Array;
  oTo: Int32Array;
  oLen: Float64Array;
  oAdj: Float64Array;
  /** priceCents, Infinity when unknown (unknown ranks last). */
  oPrice: Float64Array;
  // Groups: maximal runs of orientations with the same (from, to).
  gFrom: Int32Array;
  gTo: Int32Array;
  gStart: Int32Array;
  gEnd: Int32Array;
  gMinLen: Float64Array;
  gMaxLenAdj: Float64Array;
  gMaxAdj: Float64Array;
  gMinPrice: Float64Array;
  /** Least weight of the group's parts (unknown = 0, as the load warning counts it). */
  gMinWeight: Float64Array;
  /** Groups leaving face f: [faceOut[f], faceOut[f + 1]). */
  faceOut: Int32Array;
  /** Groups entering face f: inGroups[faceIn[f] .. faceIn[f + 1]). */
  inGroups: Int32Array;
  faceIn: Int32Array;
  /** Largest of a few round steps (mm) that every length and adjustment is a multiple of. */
  grainMm: number | null;
  /** The face graph for Dijkstra: one edge per group, the lightest orientation. */
  graph: DirectedGraphType<Record<string, never>, { weight: number; orient: number }>;
  buildMs: number;
};

const GRAINS = [1, 0.5, 0.25, 0.2, 0.1, 0.05, 0.02, 0.01];

export function isMultiple(value: number, step: number): boolean {
  const q = value / step;
  return Math.abs(q - Math.round(q)) < 1e-9;
}

/** The largest candidate step that every value is a multiple of, or null. */
export function grainOf(values: ArrayLike<number>, candidates: readonly number[] = GRAINS): number | null {
  let from = 0; // candidates are tried largest first; a failed one never comes back
  for (let i = 0; i < values.length && from < candidates.length; i++) {
    const v = values[i];
    while (from < candidates.length && !isMultiple(v, candidates[from])) from++;
  }
  return from < candidates.length ? candidates[from] : null;
}

function usableConnector(p: Part): boolean {
  return !!p.front && !!p.rear && Number.isFinite(p.lengthMm) && p.lengthMm >= 0 && (p.quantity === undefined || p.quantity >= 1);
}

export function buildModel(parts: readonly Part[]): Model {
  const t0 = performance.now();
  const faces = new FaceTable();
  const quantity = new Float64Array(parts.length);
  const aperture = new Float64Array(parts.length), weight = new Float64Array(parts.length);
  const cap = parts.length * 2;
  const rPart = new Int32Array(cap), rRev = new Uint8Array(cap), rFrom = new Int32Array(cap), rTo = new Int32Array(cap);
  const rLen = new Float64Array(cap), rAdj = new Float64Array(cap), rPrice = new Float64Array(cap);
  let n = 0;
  for (let i = 0; i < parts.length; i++) {
    const p = parts[i];
    quantity[i] = p.quantity === undefined ? Infinity : Math.floor(p.quantity);
    aperture[i] = typeof p.clearApertureMm === "number" ? p.clearApertureMm : Number.NaN;
    weight[i] = typeof p.weightG === "number" ? p.weightG : 0;
    if (!usableConnector(p)) continue;
    const front = p.front!, rear = p.rear!;
    const len = p.lengthMm, adj = Math.max(0, p.adjustMm ?? 0), price = p.priceCents ?? Infinity;
    rPart[n] = i; rRev[n] = 0; rFrom[n] = faces.entryOf(front); rTo[n] = faces.exitOf(rear);
    rLen[n] = len; rAdj[n] = adj; rPrice[n] = price; n++;
    if (turnsAround(p)) {
      rPart[n] = i; rRev[n] = 1; rFrom[n] = faces.entryOf(rear); rTo[n] = faces.exitOf(front);
      rLen[n] = len; rAdj[n] = adj; rPrice[n] = price; n++;
    }
  }
  const order = new Uint32Array(n);
  for (let i = 0; i < n; i++) order[i] = i;
  order.sort((a, b) =>
    rFrom[a] - rFrom[b] || rTo[a] - rTo[b] || rLen[a] - rLen[b] || cmpPrice(rPrice[a], rPrice[b]) ||
    rPart[a] - rPart[b] || rRev[a] - rRev[b]);

  const oPart = new Int32Array(n), oRev = new Uint8Array(n), oFrom = new Int32Array(n), oTo = new Int32Array(n);
  const oLen = new Float64Array(n), oAdj = new Float64Array(n), oPrice = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const src = order[k];
    oPart[k] = rPart[src]; oRev[k] = rRev[src]; oFrom[k] = rFrom[src]; oTo[k] = rTo[src];
    oLen[k] = rLen[src]; oAdj[k] = rAdj[src]; oPrice[k] = rPrice[src];
  }

  const groups: number[] = [];
  for (let k = 0; k < n; k++) if (k === 0 || oFrom[k] !== oFrom[k - 1] || oTo[k] !== oTo[k - 1]) groups.push(k);
  const G = groups.length;
  const gFrom = new Int32Array(G), gTo = new Int32Array(G), gStart = new Int32Array(G), gEnd = new Int32Array(G);
  const gMinLen = new Float64Array(G), gMaxLenAdj = new Float64Array(G), gMaxAdj = new Float64Array(G), gMinPrice = new Float64Array(G);
  const gMinWeight = new Float64Array(G);
  for (let g = 0; g < G; g++) {
    const s = groups[g], e = g + 1 < G ? groups[g + 1] : n;
    gFrom[g] = oFrom[s]; gTo[g] = oTo[s]; gStart[g] = s; gEnd[g] = e; gMinLen[g] = oLen[s];
    let maxLA = 0, maxA = 0, minP = Infinity, minW = Infinity;
    for (let k = s; k < e; k++) {
      if (oLen[k] + oAdj[k] > maxLA) maxLA = oLen[k] + oAdj[k];
      if (oAdj[k] > maxA) maxA = oAdj[k];
      if (oPrice[k] < minP) minP = oPrice[k];
      minW = Math.min(minW, weight[oPart[k]]);
    }
    gMaxLenAdj[g] = maxLA; gMaxAdj[g] = maxA; gMinPrice[g] = minP; gMinWeight[g] = minW;
  }

  const F = faces.size;
  const faceOut = new Int32Array(F + 1).fill(G);
  for (let g = G - 1; g >= 0; g--) faceOut[gFrom[g]] = g;
  for (let f = F - 1; f >= 0; f--) if (faceOut[f] > faceOut[f + 1]) faceOut[f] = faceOut[f + 1];
  const inGroups = new Int32Array(G);
  for (let g = 0; g < G; g++) inGroups[g] = g;
  inGroups.sort((a, b) => gTo[a] - gTo[b] || a - b);
  const faceIn = new Int32Array(F + 1).fill(G);
  for (let i = G - 1; i >= 0; i--) faceIn[gTo[inGroups[i]]] = i;
  for (let f = F - 1; f >= 0; f--) if (faceIn[f] > faceIn[f + 1]) faceIn[f] = faceIn[f + 1];

  const g1 = grainOf(oLen), g2 = grainOf(oAdj);
  const grainMm = g1 === null || g2 === null ? null : grainOf([g1, g2]);
  const model: Omit<Model, "graph" | "buildMs"> = {
    parts, faces, quantity, aperture, weight, oPart, oRev, oFrom, oTo, oLen, oAdj, oPrice,
    gFrom, gTo, gStart, gEnd, gMinLen, gMaxLenAdj, gMaxAdj, gMinPrice, gMinWeight, faceOut, inGroups, faceIn, grainMm,
  };
  const graph = buildFaceGraph(model);
  return { ...model, graph, buildMs: performance.now() - t0 };
}

const cache = new WeakMap<readonly Part[], Model>();

/**
 * The model for a parts array, built once and reused while the same array object comes
 * back (the catalog route keeps one array per catalog version). Treat the array as
 * immutable: a changed length triggers a rebuild, edits in place are not detected.
 */
export function getModel(parts: readonly Part[]): Model {
  const hit = cache.get(parts);
  if (hit && hit.quantity.length === parts.length) return hit;
  const model = buildModel(parts);
  cache.set(parts, model);
  return model;
}
