// graphology-shortest-path as the oracle for `shortest` on larger random catalogs: with
// unlimited stock and room for enough parts, the shortest chain is exactly Dijkstra's path
// on a graph with a node per (face, leg) and the lightest part on each edge.
import fc from "fast-check";
import Graph from "graphology";
import { dijkstra } from "graphology-shortest-path";
import { describe, expect, it } from "vitest";
import { solveTrain, type Part, type SolveRequest } from "@/lib/solver";
import { chainProblems } from "./support/brute-force";

const flip = (g: string) => (g === "male" ? "female" : "male");

function oracle(req: SolveRequest): { d: number; parts: number } | null {
  const g = new Graph({ type: "directed", multi: false });
  const key = (i: string, gender: string, leg: number) => `${i}|${gender}@${leg}`;
  const edge = (u: string, v: string, w: number, isPart: boolean) => {
    g.mergeNode(u); g.mergeNode(v);
    const e = g.edge(u, v);
    if (e === undefined) g.addDirectedEdge(u, v, { weight: w, isPart });
    else if (g.getEdgeAttribute(e, "weight") > w) g.mergeEdgeAttributes(e, { weight: w, isPart });
  };
  const stations = req.stations ?? [];
  const faces = (p: Part) => [[p.front!, p.rear!], ...(p.reversible ? [[p.rear!, p.front!]] : [])];
  for (let leg = 0; leg <= stations.length; leg++) {
    for (const p of req.parts) for (const [f, r] of faces(p)) edge(key(f.interface, flip(f.gender), leg), key(r.interface, r.gender, leg), p.lengthMm, true);
    if (leg < stations.length) {
      for (const [f, r] of faces(stations[leg])) edge(key(f.interface, flip(f.gender), leg), key(r.interface, r.gender, leg + 1), stations[leg].lengthMm, false);
    }
  }
  const from = key(req.optics.rear!.interface, req.optics.rear!.gender, 0);
  const to = key(req.camera.front!.interface, flip(req.camera.front!.gender), stations.length);
  g.mergeNode(from); g.mergeNode(to);
  const path = dijkstra.bidirectional(g, from, to, "weight") as string[] | null;
  if (!path) return null;
  let d = req.camera.lengthMm, parts = 0;
  for (let i = 1; i < path.length; i++) {
    const e = g.edge(path[i - 1], path[i])!;
    d += g.getEdgeAttribute(e, "weight");
    if (g.getEdgeAttribute(e, "isPart")) parts++;
  }
  return { d, parts };
}

const arb = fc.record({
  nIf: fc.integer({ min: 6, max: 14 }),
  nParts: fc.integer({ min: 60, max: 400 }),
  nStations: fc.integer({ min: 0, max: 3 }),
  seed: fc.integer({ min: 1, max: 1_000_000 }),
}).map(({ nIf, nParts, nStations, seed }): SolveRequest => {
  let s = seed;
  const r = () => ((s = (s * 48271) % 2147483647) / 2147483647);
  const port = () => ({ interface: `I${Math.floor(r() * nIf)}`, gender: r() < 0.5 ? "male" as const : "female" as const });
  const mk = (id: string): Part => ({ id, front: port(), rear: port(), lengthMm: Math.round(r() * 300) / 10, reversible: r() < 0.3 });
  return {
    optics: { id: "optics", front: null, rear: port(), lengthMm: 0, backFocusMm: 20 + r() * 80 },
    camera: { id: "camera", front: port(), rear: null, lengthMm: Math.round(r() * 200) / 10 },
    stations: Array.from({ length: nStations }, (_, i) => mk(`station${i}`)),
    parts: Array.from({ length: nParts }, (_, i) => mk(`p${i}`)),
    maxParts: 16,
    maxSolutions: 3,
  };
});

describe("shortest chain against graphology's Dijkstra", () => {
  it("has the same length on random catalogs of 60–400 parts", () => {
    let compared = 0;
    fc.assert(fc.property(arb, (req) => {
      const want = oracle(req);
      const res = solveTrain(req);
      if (!want) {
        expect(res.shortest).toBeNull();
        expect(res.status).toBe("no-connection");
        return;
      }
      if (want.parts > 16) return; // Dijkstra's path would break maxParts: not comparable
      compared++;
      expect(res.shortest).not.toBeNull();
      expect(res.shortest!.sensorDistanceMm).toBeCloseTo(want.d, 9);
      expect(chainProblems(req, res.shortest!, res.targetMm, "min")).toEqual([]);
    }), { numRuns: 120 });
    expect(compared).toBeGreaterThan(60);
  });
});
