// solveTrain against a brute-force enumerator (tests/unit/support/brute-force.ts) on small
// random catalogs: same status, same shortest D, the same ranked solution multisets (ties
// in the full ranking key compared as sets), same nearest distances, and every chain sound.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { solveTrain, type Part, type Port, type SolveRequest, type SolveResult } from "@/lib/solver";
import { tuning } from "@/lib/solver/walker";
import { bruteForce, chainProblems, compareSolutions, enumerateChains, multisetOf, type Oracle, type OracleSolution } from "./support/brute-force";

const IFACES = ["A", "B", "C", "D", "E", "F"];

/** Most faces are the usual female front / male rear, on the first few interfaces. */
const port = (ifaces: string[], usual: "male" | "female" = "male"): fc.Arbitrary<Port> =>
  fc.record({
    interface: fc.oneof({ arbitrary: fc.constantFrom(...ifaces.slice(0, 2)), weight: 5 }, { arbitrary: fc.constantFrom(...ifaces), weight: 1 }),
    gender: fc.oneof({ arbitrary: fc.constant(usual), weight: 3 }, { arbitrary: fc.constant(usual === "male" ? "female" as const : "male" as const), weight: 1 }),
  });

/** Half-millimetre lengths (exact bitsets) or arbitrary doubles (coarse buckets). */
const length = (coarse: boolean, max: number) =>
  coarse ? fc.double({ min: 0, max, noNaN: true, noDefaultInfinity: true }) : fc.integer({ min: 0, max: 2 * max }).map((x) => x / 2);

/** `arb` with probability p (in tenths), otherwise undefined. */
const optional = <T>(arb: fc.Arbitrary<T>, p = 0.5): fc.Arbitrary<T | undefined> =>
  fc.oneof({ arbitrary: arb, weight: Math.round(p * 10) }, { arbitrary: fc.constant(undefined), weight: 10 - Math.round(p * 10) });

function partArb(ifaces: string[], coarse: boolean, id: string): fc.Arbitrary<Part> {
  return fc.record({
    front: port(ifaces, "female"),
    rearPort: port(ifaces, "male"),
    sameThread: fc.boolean(),
    lengthMm: length(coarse, 15),
    adjustMm: optional(length(coarse, 4), 0.25),
    reversible: fc.boolean(),
    quantity: optional(fc.integer({ min: 1, max: 3 }), 0.6),
    priceCents: optional(fc.integer({ min: 0, max: 40 }).map((x) => x * 100), 0.8),
    named: fc.boolean(),
  }).map(({ named, rearPort, sameThread, ...p }) => ({
    id, ...(named ? { name: `Part ${id}` } : {}), ...p,
    // Half the parts keep one thread (spacers, couplers), the others adapt between two.
    rear: sameThread ? { interface: p.front.interface, gender: rearPort.gender } : rearPort,
  }));
}

/** A request, and sometimes where to aim its back focus among the real chains (set in the property). */
export type AimedRequest = SolveRequest & { aim?: { pick: number; offset: number } };
export const requestArb: fc.Arbitrary<AimedRequest> = fc.record({
  nIf: fc.integer({ min: 3, max: 6 }),
  nParts: fc.integer({ min: 2, max: 8 }),
  nStations: fc.integer({ min: 0, max: 2 }),
  coarse: fc.boolean(),
}).chain(({ nIf, nParts, nStations, coarse }) => {
  const ifaces = IFACES.slice(0, nIf);
  return fc.record({
    parts: fc.tuple(...Array.from({ length: nParts }, (_, i) => partArb(ifaces, coarse, `p${i}`))),
    stations: fc.tuple(...Array.from({ length: nStations }, (_, i) => partArb(ifaces, coarse, `s${i}`)))
      .map((list) => list.map(({ quantity: _q, priceCents: _p, ...s }) => s)),
    opticsRear: port(ifaces),
    cameraFront: port(ifaces, "female"),
    cameraLen: length(coarse, 12),
    cameraAdj: optional(length(coarse, 3), 0.2),
    backFocus: optional(fc.integer({ min: 0, max: 120 }).map((x) => x / 2), 0.8),
    /** Sometimes aim the back focus at a real chain's length (set in the property). */
    aim: optional(fc.record({ pick: fc.double({ min: 0, max: 1, noNaN: true }), offset: fc.integer({ min: -6, max: 6 }).map((x) => x / 4) }), 0.5),
    tolerance: optional(fc.constantFrom(0, 0.1, 0.25, 0.5, 1), 0.7),
    filters: fc.array(fc.record({ thicknessMm: fc.constantFrom(1, 2, 3), refractiveIndex: optional(fc.constantFrom(1.5, 1.5168)) }), { maxLength: 2 }),
    maxParts: fc.oneof({ arbitrary: fc.integer({ min: 1, max: 4 }), weight: 9 }, { arbitrary: fc.constant(0), weight: 1 }),
    maxSolutions: optional(fc.integer({ min: 1, max: 6 }), 0.8),
    /** Per leg, maybe a part that bridges it directly, so that more requests connect. */
    bridges: fc.array(fc.option(fc.record({ lengthMm: length(coarse, 15), quantity: optional(fc.integer({ min: 1, max: 2 }), 0.5) }), { nil: undefined }), { minLength: 3, maxLength: 3 }),
  }).map((g) => {
    const starts = [g.opticsRear, ...g.stations.map((st) => st.rear)];
    const ends = [...g.stations.map((st) => st.front), g.cameraFront];
    const flip = (pt: Port | null): Port | null => (pt ? { interface: pt.interface, gender: pt.gender === "male" ? "female" : "male" } : null);
    const extra: Part[] = [];
    starts.forEach((from, leg) => {
      const b = g.bridges[leg];
      if (b && from && ends[leg]) extra.push({ id: `b${leg}`, front: flip(from), rear: flip(ends[leg]), ...b });
    });
    return { ...g, parts: [...g.parts, ...extra] };
  }).map((g): SolveRequest & { aim?: { pick: number; offset: number } } => ({
    aim: g.aim,
    optics: {
      id: "optics", name: "Corrector", front: null, rear: g.opticsRear, lengthMm: 0,
      ...(g.backFocus !== undefined ? { backFocusMm: g.backFocus } : {}),
      ...(g.tolerance !== undefined ? { backFocusToleranceMm: g.tolerance } : {}),
    },
    camera: { id: "camera", front: g.cameraFront, rear: null, lengthMm: g.cameraLen, ...(g.cameraAdj !== undefined ? { adjustMm: g.cameraAdj } : {}) },
    stations: g.stations,
    filters: g.filters,
    parts: g.parts,
    maxParts: g.maxParts,
    ...(g.maxSolutions !== undefined ? { maxSolutions: g.maxSolutions } : {}),
  }));
});

/**
 * The walk builds its bitset bound only when a search proves expensive, which small catalogs
 * never do, and bounds-and-sorts siblings unless there are very many; this runs the other
 * way on both counts (bitsets on every level, siblings in length order), so both are compared.
 */
function withBitsetsEverywhere<T>(run: () => T): T {
  const saved = { ...tuning };
  tuning.walkBudget = 0;
  tuning.sortLimit = 0;
  try { return run(); } finally { Object.assign(tuning, saved); }
}

function multisetOfChain(chain: SolveResult["solutions"][number]): string {
  return multisetOf(chain.steps.filter((s) => s.role === "connector").map((s) => s.partId));
}

/** Compare one solver result with the oracle; returns the disagreements. */
export function disagreements(req: SolveRequest, res: SolveResult, oracle: Oracle): string[] {
  const out: string[] = [];
  if (res.status !== oracle.status) return [`status ${res.status}, oracle ${oracle.status}`];
  if (oracle.shortestD === null) {
    if (res.shortest !== null) out.push("shortest should be null");
  } else if (!res.shortest || Math.abs(res.shortest.sensorDistanceMm - oracle.shortestD) > 1e-9) {
    out.push(`shortest D ${res.shortest?.sensorDistanceMm}, oracle ${oracle.shortestD}`);
  }
  if (res.shortest) out.push(...chainProblems(req, res.shortest, oracle.target, "min").map((p) => `shortest: ${p}`));
  if ((res.targetMm === null) !== (oracle.target === null) || (oracle.target !== null && Math.abs(res.targetMm! - oracle.target) > 1e-12)) {
    out.push(`target ${res.targetMm}, oracle ${oracle.target}`);
  }
  if (Math.abs(res.filterShiftMm - oracle.filterShift) > 1e-12) out.push("filter shift differs");
  if (res.status !== "ok" && !res.reason) out.push("no reason");

  const wanted = oracle.status === "ok" ? Math.min(req.maxSolutions ?? 5, oracle.ranked.length) : 0;
  if (res.solutions.length !== wanted) out.push(`${res.solutions.length} solutions, oracle wants ${wanted}`);
  const byMultiset = new Map(oracle.ranked.map((s) => [s.multiset, s]));
  const mine: OracleSolution[] = [];
  const seen = new Set<string>();
  for (const chain of res.solutions) {
    const ms = multisetOfChain(chain);
    if (seen.has(ms)) out.push(`multiset ${ms} twice`);
    seen.add(ms);
    out.push(...chainProblems(req, chain, oracle.target, "target").map((p) => `${ms}: ${p}`));
    const o = byMultiset.get(ms);
    if (!o) { out.push(`multiset ${ms} is not a solution`); continue; }
    if (chain.partCount !== o.k || chain.priceCents !== o.price || Math.abs(chain.sensorDistanceMm - o.d) > 1e-6 ||
      (o.err === null ? chain.errorMm !== null : Math.abs(chain.errorMm! - o.err) > 1e-6)) {
      out.push(`multiset ${ms}: got k=${chain.partCount} err=${chain.errorMm} price=${chain.priceCents} D=${chain.sensorDistanceMm}, oracle ${JSON.stringify(o)}`);
    }
    mine.push(o);
  }
  for (let i = 1; i < mine.length; i++) if (compareSolutions(mine[i - 1], mine[i]) > 0) out.push(`ranking broken at ${i}`);
  if (wanted > 0 && mine.length === wanted) {
    const cutoff = oracle.ranked[wanted - 1];
    for (const s of oracle.ranked) {
      if (compareSolutions(s, cutoff) < 0 && !seen.has(s.multiset)) out.push(`missing ${s.multiset} ${JSON.stringify(s)}`);
    }
    for (const s of mine) if (compareSolutions(s, cutoff) > 0) out.push(`${s.multiset} ranks below the cut-off`);
    if (mine[0].k !== oracle.ranked[0].k) out.push(`best part count ${mine[0].k}, oracle ${oracle.ranked[0].k}`);
  }
  if (oracle.status === "out-of-reach") {
    const n = res.nearest;
    const o = oracle.nearest!;
    const same = (a: number | null | undefined, b: number | null) => (a === null || a === undefined ? b === null : b !== null && Math.abs(a - b) < 1e-6);
    if (!n || !same(n.belowMm, o.belowMm) || !same(n.aboveMm, o.aboveMm)) out.push(`nearest ${JSON.stringify(n)}, oracle ${JSON.stringify(o)}`);
  }
  return out;
}

describe("solveTrain agrees with a brute-force enumerator", () => {
  it("on random small catalogs (status, shortest, ranked multisets, nearest, chain invariants)", () => {
    const statuses = new Map<string, number>();
    fc.assert(
      fc.property(requestArb, ({ aim, ...req }) => {
        if (aim && req.optics.backFocusMm !== undefined) {
          const chains = enumerateChains(req);
          const shift = (req.filters ?? []).reduce((s, f) => s + (f.thicknessMm * ((f.refractiveIndex ?? 1.5) - 1)) / (f.refractiveIndex ?? 1.5), 0);
          const chosen = chains[Math.floor(aim.pick * chains.length)];
          if (chosen) req.optics.backFocusMm = Math.max(0, chosen.dMin + aim.offset - shift);
        }
        const oracle = bruteForce(req);
        statuses.set(oracle.status, (statuses.get(oracle.status) ?? 0) + 1);
        expect(disagreements(req, solveTrain(req), oracle)).toEqual([]);
        expect(disagreements(req, withBitsetsEverywhere(() => solveTrain(req)), oracle)).toEqual([]);
      }),
      { numRuns: 600 },
    );
    // The generator must actually reach every status, or the comparison proves little.
    for (const s of ["ok", "no-connection", "too-long", "out-of-reach"]) expect(statuses.get(s) ?? 0).toBeGreaterThan(10);
  });

  it("on catalogs dense with same-face spacers (loops), with ties in price and length", () => {
    const spacerCatalog = fc.record({
      lengths: fc.array(fc.constantFrom(0.5, 1, 2, 2.5, 5, 10), { minLength: 3, maxLength: 7 }),
      prices: fc.array(fc.constantFrom(100, 200), { minLength: 7, maxLength: 7 }),
      qty: fc.array(fc.option(fc.integer({ min: 1, max: 3 }), { nil: undefined }), { minLength: 7, maxLength: 7 }),
      backFocus: fc.integer({ min: 34, max: 90 }).map((x) => x / 2),
      maxSolutions: fc.integer({ min: 1, max: 8 }),
    }).map(({ lengths, prices, qty, backFocus, maxSolutions }): SolveRequest => ({
      optics: { id: "o", front: null, rear: { interface: "T", gender: "male" }, lengthMm: 0, backFocusMm: backFocus },
      camera: { id: "c", front: { interface: "T", gender: "female" }, rear: null, lengthMm: 12.5 },
      stations: [{ id: "w", front: { interface: "T", gender: "female" }, rear: { interface: "T", gender: "male" }, lengthMm: 5 }],
      parts: lengths.map((l, i) => ({
        id: `s${i}`, front: { interface: "T", gender: "female" as const }, rear: { interface: "T", gender: "male" as const },
        lengthMm: l, priceCents: prices[i], ...(qty[i] !== undefined ? { quantity: qty[i] } : {}),
      })),
      maxParts: 3,
      maxSolutions,
    }));
    fc.assert(fc.property(spacerCatalog, (req) => {
      const oracle = bruteForce(req);
      expect(disagreements(req, solveTrain(req), oracle)).toEqual([]);
      expect(disagreements(req, withBitsetsEverywhere(() => solveTrain(req)), oracle)).toEqual([]);
    }), { numRuns: 150 });
  });
});
