// One plain sentence saying why a request has no solution, naming things as people do.

import { describePort, listAnd, mm, nameOf } from "./format";
import type { Problem } from "./problem";
import { constrainedShortest } from "./shortest";
import type { Tables } from "./tables";
import type { Chain, Nearest } from "./types";

/** Least number of connecting parts of any chain, ignoring stock (0-1 BFS over legs). */
function fewestParts(p: Problem): number {
  const m = p.model;
  const dist = p.rel.map((r) => new Int32Array(r.length).fill(-1));
  const deque: [number, number, number][] = [[0, p.start, 0]];
  while (deque.length) {
    const [leg, f, d] = deque.shift()!;
    const li = p.loc[leg][f];
    if (li < 0 || (dist[leg][li] >= 0 && dist[leg][li] <= d)) continue;
    dist[leg][li] = d;
    if (leg === p.S && f === p.camEntry) return d;
    if (leg < p.S) for (const mt of p.exits[leg]) if (mt.entry === f) deque.unshift([leg + 1, mt.exit, d]);
    if (f < m.faces.size) for (let g = m.faceOut[f]; g < m.faceOut[f + 1]; g++) deque.push([leg, m.gTo[g], d + 1]);
  }
  return Infinity;
}

function legEnds(p: Problem, leg: number): { from: string; to: string } {
  const { optics, camera } = p.req;
  let from: string;
  if (leg === 0) from = `the ${describePort(optics.rear!)} rear of ${nameOf(optics)}`;
  else {
    const st = p.stations[leg - 1];
    const mt = p.mounts[leg - 1].find((x) => p.fwd[leg - 1][x.entry]) ?? p.mounts[leg - 1][0];
    const port = mt?.rev ? st.front! : st.rear!;
    from = `the ${describePort(port)} ${mt?.rev ? "front (mounted reversed)" : "rear"} of ${nameOf(st)}`;
  }
  const next = leg < p.S ? p.stations[leg] : camera;
  const either = leg < p.S && next.reversible ? " either way round" : "";
  return { from, to: `the ${describePort(next.front!)} front of ${nameOf(next)}${either}` };
}

export function noConnectionReason(p: Problem, t: Tables | null): string {
  const { optics, camera } = p.req;
  if (!optics.rear) return `${nameOf(optics)} has no rear (sensor-side) face to connect to.`;
  if (!camera.front) return `${nameOf(camera)} has no front face to connect to.`;
  const broken = p.stations.find((s) => !s.front || !s.rear);
  if (broken) return `${nameOf(broken)} needs both a front and a rear face to sit in the train.`;
  if (p.blockedLeg >= 0) {
    const { from, to } = legEnds(p, p.blockedLeg);
    return `Nothing available joins ${from} to ${to}.`;
  }
  const fewest = fewestParts(p);
  if (fewest > p.maxParts) {
    return `Joining ${nameOf(optics)} to ${nameOf(camera)} takes at least ${fewest} connecting parts, more than the limit of ${p.maxParts}.`;
  }
  const loose = t ? constrainedShortest(p, t, true) : null;
  if (loose) {
    const counts = new Map<number, number>();
    for (const mv of loose) if (mv >= 0) counts.set(p.model.oPart[mv], (counts.get(p.model.oPart[mv]) ?? 0) + 1);
    for (const [part, n] of counts) {
      const q = p.model.quantity[part];
      if (n > q) {
        return `No connection fits the stock: the shortest one needs ${n} × ${nameOf(p.model.parts[part])} but only ${q} ${q === 1 ? "is" : "are"} in stock.`;
      }
    }
  }
  return `No connection within ${p.maxParts} connecting parts fits the stock available.`;
}

/** Decimal places the request's tolerance was given with (0.05 → 2), at least 1, at most 3. */
function placesOf(p: Problem): number {
  const tol = p.tol ?? 0.5;
  for (let d = 1; d <= 3; d++) if (Math.abs(Math.round(tol * 10 ** d) - tol * 10 ** d) < 1e-6) return d;
  return 3;
}

/** Lengths in a window sentence, to the precision the tolerance was given with. */
const fine = (p: Problem, x: number): string => {
  const t = x.toFixed(placesOf(p));
  return `${Number(t) === 0 ? (0).toFixed(placesOf(p)) : t} mm`;
};

function windowText(p: Problem): string {
  const glass = p.filterShift > 0 ? ` (${fine(p, p.req.optics.backFocusMm!)} back focus + ${fine(p, p.filterShift)} for filter glass)` : "";
  return `${fine(p, p.target!)} ± ${fine(p, p.tol!)}${glass}`;
}

export function tooLongReason(p: Problem, shortest: Chain): string {
  const excess = shortest.sensorDistanceMm - (p.target! + p.tol!);
  const names = new Map<string, string>();
  for (const part of [...p.req.parts, ...p.stations, p.req.camera]) if (!names.has(part.id)) names.set(part.id, nameOf(part));
  names.set(p.req.camera.id, nameOf(p.req.camera));
  const largest = [...shortest.steps]
    .sort((a, b) => b.lengthMm - a.lengthMm)
    .slice(0, 3)
    .filter((s) => s.lengthMm > 0)
    .map((s) => `${names.get(s.partId) ?? s.partId} (${mm(s.lengthMm)})`);
  const most = largest.length ? `; most of the length is in ${listAnd(largest)}` : "";
  return `Even the shortest chain is ${fine(p, excess)} too long: it reaches ${fine(p, shortest.sensorDistanceMm)} against ${windowText(p)}${most}.`;
}

export function outOfReachReason(p: Problem, nearest: Nearest): string {
  const T = p.target!;
  const parts: string[] = [];
  if (nearest.belowMm !== null) parts.push(`${fine(p, nearest.belowMm)} (${fine(p, T - nearest.belowMm)} short of the target)`);
  if (nearest.aboveMm !== null) parts.push(`${fine(p, nearest.aboveMm)} (${fine(p, nearest.aboveMm - T)} beyond it)`);
  const closest = parts.length === 2 ? `the closest reachable distances are ${parts[0]} and ${parts[1]}`
    : `the closest reachable distance is ${parts[0] ?? "unknown"}`;
  return `No combination of the available parts lands in ${windowText(p)}: ${closest}.`;
}
