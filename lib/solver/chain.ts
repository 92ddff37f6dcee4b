// Dress a found sequence of moves as a contract Chain: steps with their lengths (adjustable
// parts set nearest the target, or at their minimum), start positions, joints and warnings.

import type { Problem } from "./problem";
import { decodeStationMove } from "./moves";
import type { Chain, Part, Step } from "./types";
import { countDetours } from "./detours";
import { chainWarnings } from "./warnings";

type Raw = { part: Part; role: Step["role"]; reversed: boolean; len: number; adj: number };

function rawSteps(p: Problem, moves: readonly number[]): Raw[] {
  const m = p.model;
  const out: Raw[] = [];
  for (const mv of moves) {
    if (mv >= 0) {
      const part = m.parts[m.oPart[mv]];
      out.push({ part, role: "connector", reversed: m.oRev[mv] === 1, len: m.oLen[mv], adj: m.oAdj[mv] });
    } else {
      const { station, rev } = decodeStationMove(mv);
      const part = p.stations[station];
      out.push({ part, role: "station", reversed: rev, len: part.lengthMm, adj: Math.max(0, part.adjustMm ?? 0) });
    }
  }
  out.push({ part: p.req.camera, role: "camera", reversed: false, len: p.camLen, adj: p.camAdj });
  return out;
}

/**
 * setting "target": adjustable steps, in order, take up the distance to the target (D is
 * clamped into [Dmin, Dmax]); "min": every adjustable step at its shortest.
 */
export function materialize(p: Problem, moves: readonly number[], setting: "target" | "min"): Chain {
  const raw = rawSteps(p, moves);
  let dMin = 0, dMax = 0;
  for (const s of raw) { dMin += s.len; dMax += s.len + s.adj; }
  let extra = 0;
  if (setting === "target" && p.target !== null) extra = Math.min(Math.max(p.target, dMin), dMax) - dMin;
  const steps: Step[] = [];
  let at = 0, partCount = 0, price: number | null = 0;
  for (const s of raw) {
    const take = Math.min(s.adj, Math.max(0, extra));
    extra -= take;
    const face = s.reversed ? s.part.rear : s.part.front;
    steps.push({ partId: s.part.id, role: s.role, reversed: s.reversed, lengthMm: s.len + take, startMm: at, joint: { interface: face!.interface } });
    at += s.len + take;
    if (s.role === "connector") {
      partCount++;
      price = price === null || s.part.priceCents === undefined || s.part.priceCents === null ? null : price + s.part.priceCents;
    }
  }
  const chain: Chain = {
    steps,
    sensorDistanceMm: at,
    errorMm: p.target === null ? null : at - p.target,
    partCount,
    priceCents: price,
    detours: countDetours(steps),
    warnings: [],
  };
  chain.warnings = chainWarnings(p, chain, raw.map((r) => r.part));
  return chain;
}
