// The state graph in graphology: a node per open face, an edge per (from, to) pair carrying
// the lightest orientation (parallel parts collapsed, as Dijkstra wants). Legs between
// stations are handled by running Dijkstra once per leg on this one graph.

import Graph from "graphology";
import type { Model } from "./model";

type GraphInput = Pick<Model, "faces" | "gFrom" | "gTo" | "gStart" | "oLen">;

export function buildFaceGraph(m: GraphInput): Model["graph"] {
  const graph: Model["graph"] = new Graph({ type: "directed", multi: false, allowSelfLoops: false });
  for (let f = 0; f < m.faces.size; f++) graph.addNode(m.faces.nodeKey(f));
  for (let g = 0; g < m.gFrom.length; g++) {
    const from = m.gFrom[g], to = m.gTo[g];
    if (from === to) continue; // a spacer never shortens a chain
    const o = m.gStart[g]; // groups are sorted by length: the first is the lightest
    graph.addDirectedEdge(m.faces.nodeKey(from), m.faces.nodeKey(to), { weight: m.oLen[o], orient: o });
  }
  return graph;
}
