// The shortest chain: Dijkstra (graphology-shortest-path) on the face graph from each leg's
// start, joined through the stations' mounts. Dijkstra knows nothing of stock or maxParts — it may
// use one part in two legs, or more parts than allowed — so its answer is checked and, when
// it breaks a limit, an exact constrained search takes over.

import { dijkstra } from "graphology-shortest-path";
import type { Model } from "./model";
import type { Problem } from "./problem";
import type { Tables } from "./tables";
import { stationMove } from "./moves";

type LegPath = { len: number; moves: number[] } | null;

/**
 * Shortest-path trees of a catalog's face graph, one per source face, kept with the graph:
 * the same faces (popular optics, cameras, devices) start legs request after request.
 */
const trees = new WeakMap<Model, Map<number, Record<string, string[]>>>();
const TREES_KEPT = 512;

function treeFrom(m: Model, from: number): Record<string, string[]> {
  let perModel = trees.get(m);
  if (!perModel) trees.set(m, (perModel = new Map()));
  let tree = perModel.get(from);
  if (!tree) {
    tree = dijkstra.singleSource(m.graph, m.faces.nodeKey(from), "weight");
    if (perModel.size >= TREES_KEPT) perModel.clear();
    perModel.set(from, tree);
  }
  return tree;
}

function legPath(p: Problem, from: number, to: number, memo: Map<string, LegPath>): LegPath {
  const key = `${from}>${to}`;
  if (memo.has(key)) return memo.get(key)!;
  let out: LegPath = null;
  const m = p.model;
  if (from === to) out = { len: 0, moves: [] };
  else if (from < m.faces.size && to < m.faces.size) {
    const nodes = treeFrom(m, from)[m.faces.nodeKey(to)];
    if (nodes && nodes.length > 1) {
      const moves: number[] = [];
      let len = 0;
      for (let i = 1; i < nodes.length; i++) {
        const o = m.graph.getEdgeAttributes(m.graph.edge(nodes[i - 1], nodes[i])!).orient;
        moves.push(o);
        len += m.oLen[o];
      }
      out = { len, moves };
    }
  }
  memo.set(key, out);
  return out;
}

/** Dijkstra's chain, ignoring stock and maxParts; null when nothing connects. */
export function dijkstraChain(p: Problem): number[] | null {
  if (p.start < 0 || p.camEntry < 0) return null;
  const memo = new Map<string, LegPath>();
  let states = new Map<number, { len: number; moves: number[] }>([[p.start, { len: 0, moves: [] }]]);
  for (let leg = 0; leg < p.S; leg++) {
    const next = new Map<number, { len: number; moves: number[] }>();
    for (const mt of p.mounts[leg]) {
      for (const [face, st] of states) {
        const path = legPath(p, face, mt.entry, memo);
        if (!path) continue;
        const len = st.len + path.len + mt.len;
        const prev = next.get(mt.exit);
        if (!prev || len < prev.len) next.set(mt.exit, { len, moves: [...st.moves, ...path.moves, stationMove(mt.station, mt.rev)] });
      }
    }
    states = next;
  }
  let best: { len: number; moves: number[] } | null = null;
  for (const [face, st] of states) {
    const path = legPath(p, face, p.camEntry, memo);
    if (path && (!best || st.len + path.len < best.len)) best = { len: st.len + path.len, moves: [...st.moves, ...path.moves] };
  }
  return best?.moves ?? null;
}

function withinLimits(p: Problem, moves: readonly number[]): boolean {
  const m = p.model;
  const count = new Map<number, number>();
  let parts = 0;
  for (const mv of moves) {
    if (mv < 0) continue;
    parts++;
    const part = m.oPart[mv];
    const c = (count.get(part) ?? 0) + 1;
    if (c > m.quantity[part]) return false;
    count.set(part, c);
  }
  return parts <= p.maxParts;
}

/**
 * Exact least-length chain under stock and maxParts: depth-first branch and bound over
 * simple paths per leg (a repeated face or a spacer never shortens a chain), bounded below
 * by the relaxed least length with the parts left.
 */
export function constrainedShortest(p: Problem, t: Tables, ignoreStock = false): number[] | null {
  const m = p.model;
  const W = t.R + 1;
  const atMost = t.minLenAtMost;
  const used = new Int32Array(m.parts.length);
  const onPath = p.rel.map(() => new Uint8Array(p.faces.size));
  const moves: number[] = [];
  let best = Infinity;
  let bestMoves: number[] | null = null;

  const dfs = (leg: number, f: number, cmin: number, u: number): void => {
    const li = p.loc[leg][f];
    if (li < 0 || p.work.exhausted) return;
    if (--p.work.left < 0) { p.work.exhausted = true; return; }
    const budget = p.maxParts - u;
    if (cmin + atMost[leg][li * W + budget] >= best) return;
    if (leg === p.S && f === p.camEntry) {
      best = cmin + p.camLen;
      bestMoves = moves.slice();
      return;
    }
    // Children, most promising first (length so far + relaxed least rest), so that the first
    // chain found is usually optimal and everything after it is cut by the bound.
    const kids: { f: number; move: number; next: number; leg: number; len: number; u: number }[] = [];
    if (budget > 0 && f < m.faces.size) {
      for (let g = m.faceOut[f]; g < m.faceOut[f + 1]; g++) {
        const to = m.gTo[g];
        const lt = p.loc[leg][to];
        if (to === f || lt < 0 || onPath[leg][to]) continue;
        const rest = atMost[leg][lt * W + budget - 1];
        for (let o = m.gStart[g]; o < m.gEnd[g]; o++) {
          if (cmin + m.oLen[o] + rest >= best) break;
          if (!ignoreStock && used[m.oPart[o]] >= m.quantity[m.oPart[o]]) continue;
          kids.push({ f: cmin + m.oLen[o] + rest, move: o, next: to, leg, len: m.oLen[o], u: u + 1 });
        }
      }
    }
    if (leg < p.S) {
      for (const mt of p.exits[leg]) {
        if (mt.entry !== f) continue;
        const lt = p.loc[leg + 1][mt.exit];
        const rest = atMost[leg + 1][lt * W + budget];
        kids.push({ f: cmin + mt.len + rest, move: stationMove(mt.station, mt.rev), next: mt.exit, leg: leg + 1, len: mt.len, u });
      }
    }
    kids.sort((a, b) => a.f - b.f);
    onPath[leg][f] = 1;
    for (const kid of kids) {
      if (kid.f >= best) break;
      // Stock was checked when the kids were listed: every sibling's walk puts back what it took.
      const part = kid.move >= 0 ? m.oPart[kid.move] : -1;
      if (part >= 0) used[part]++;
      moves.push(kid.move);
      dfs(kid.leg, kid.next, cmin + kid.len, kid.u);
      moves.pop();
      if (part >= 0) used[part]--;
    }
    onPath[leg][f] = 0;
  };
  dfs(0, p.start, 0, 0);
  return bestMoves;
}

/** The shortest chain within every limit, or null when none exists. */
export function findShortest(p: Problem, t: Tables): number[] | null {
  const fast = dijkstraChain(p);
  if (fast && withinLimits(p, fast)) return fast;
  return constrainedShortest(p, t);
}
