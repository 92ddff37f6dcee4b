// One request, prepared: defaults, target window, the faces of optics, stations and camera,
// and for every leg (segment between stations) the faces that can lie on a full chain.

import { totalFilterShiftMm } from "../optics";
import { type FaceTable, turnsAround } from "./faces";
import { getModel, type Model } from "./model";
import {
  DEFAULT_MAX_PARTS, DEFAULT_MAX_SOLUTIONS, DEFAULT_TOLERANCE_MM, LENGTH_SLACK_MM,
  type Part, type SolveRequest,
} from "./types";

/** One way to mount a station: entered from face `entry`, leaves face `exit` open. */
export type StationMount = { station: number; rev: boolean; entry: number; exit: number; len: number; adj: number };

export type Problem = {
  req: SolveRequest;
  model: Model;
  faces: FaceTable;
  /** Number of stations; legs are 0..S. */
  S: number;
  stations: Part[];
  start: number;
  mounts: StationMount[][];
  camEntry: number;
  camLen: number;
  camAdj: number;
  target: number | null;
  tol: number | null;
  /** Window with the contract's 1e-6 mm slack; ±Infinity without a target. */
  lo: number;
  hi: number;
  filterShift: number;
  maxParts: number;
  maxSolutions: number;
  /** Per leg: faces that lie on some full chain (ignoring limits), and face → local index. */
  rel: Int32Array[];
  loc: Int32Array[];
  /** Per leg: the station mounts (or nothing for the last leg) usable from a relevant face. */
  exits: StationMount[][];
  /** First leg that nothing can bridge even without limits; -1 when every leg can be. */
  blockedLeg: number;
  /** Per leg: faces reachable from the leg's start(s), ignoring limits (for reasons). */
  fwd: Uint8Array[];
  /** Search states every search of this request may still visit (see WORK_LIMIT). */
  work: { left: number; exhausted: boolean };
};

/**
 * A safety net, not a tuning knob: with thousands of arbitrary-length spacers on one face
 * the exact top-k is a k-SUM problem that no method answers in milliseconds. Past this many
 * search states a request stops and says so (`truncated`) instead of holding the server.
 */
export const WORK_LIMIT = 2_000_000;

function mountsOf(faces: FaceTable, p: Part, station: number): StationMount[] {
  if (!p.front || !p.rear) return [];
  const adj = Math.max(0, p.adjustMm ?? 0);
  const out: StationMount[] = [
    { station, rev: false, entry: faces.entryOf(p.front), exit: faces.exitOf(p.rear), len: p.lengthMm, adj },
  ];
  if (turnsAround(p)) {
    out.push({ station, rev: true, entry: faces.entryOf(p.rear), exit: faces.exitOf(p.front), len: p.lengthMm, adj });
  }
  return out;
}

function walk(m: Model, F: number, seeds: number[], backward: boolean): Uint8Array {
  const seen = new Uint8Array(F);
  const stack: number[] = [];
  for (const s of seeds) if (s >= 0 && !seen[s]) { seen[s] = 1; stack.push(s); }
  const modelF = m.faces.size;
  while (stack.length) {
    const f = stack.pop()!;
    if (f >= modelF) continue;
    if (!backward) {
      for (let g = m.faceOut[f]; g < m.faceOut[f + 1]; g++) {
        const t = m.gTo[g];
        if (!seen[t]) { seen[t] = 1; stack.push(t); }
      }
    } else {
      for (let i = m.faceIn[f]; i < m.faceIn[f + 1]; i++) {
        const t = m.gFrom[m.inGroups[i]];
        if (!seen[t]) { seen[t] = 1; stack.push(t); }
      }
    }
  }
  return seen;
}

export function prepare(req: SolveRequest): Problem {
  const model = getModel(req.parts);
  const faces = model.faces.extend();
  const stations = req.stations ?? [];
  const S = stations.length;
  const start = req.optics.rear ? faces.exitOf(req.optics.rear) : -1;
  const mounts = stations.map((p, i) => mountsOf(faces, p, i));
  const camEntry = req.camera.front ? faces.entryOf(req.camera.front) : -1;
  const F = faces.size;

  const filterShift = totalFilterShiftMm(req.filters ?? []);
  const bf = req.optics.backFocusMm;
  const target = bf === undefined || bf === null ? null : bf + filterShift;
  const tol = target === null ? null : (req.optics.backFocusToleranceMm ?? DEFAULT_TOLERANCE_MM);
  const lo = target === null ? -Infinity : target - tol! - LENGTH_SLACK_MM;
  const hi = target === null ? Infinity : target + tol! + LENGTH_SLACK_MM;

  // Forward: which faces each leg can reach from where the previous leg could end.
  const fwd: Uint8Array[] = [];
  let blockedLeg = -1;
  let seeds = start >= 0 ? [start] : [];
  for (let leg = 0; leg <= S; leg++) {
    fwd.push(walk(model, F, seeds, false));
    const reachable = fwd[leg];
    if (leg < S) {
      seeds = mounts[leg].filter((mt) => reachable[mt.entry]).map((mt) => mt.exit);
      if (seeds.length === 0 && blockedLeg < 0) blockedLeg = leg;
    } else if (camEntry < 0 || !reachable[camEntry]) {
      if (blockedLeg < 0) blockedLeg = leg;
    }
  }

  const rel: Int32Array[] = [];
  const loc: Int32Array[] = [];
  const exits: StationMount[][] = [];
  for (let leg = 0; leg <= S; leg++) { rel.push(new Int32Array(0)); loc.push(new Int32Array(F).fill(-1)); exits.push([]); }
  if (blockedLeg < 0) {
    let ends = [camEntry];
    const bwd: Uint8Array[] = new Array(S + 1);
    for (let leg = S; leg >= 0; leg--) {
      bwd[leg] = walk(model, F, ends, true);
      const list: number[] = [];
      for (let f = 0; f < F; f++) if (fwd[leg][f] && bwd[leg][f]) { loc[leg][f] = list.length; list.push(f); }
      rel[leg] = Int32Array.from(list);
      if (leg > 0) {
        const usable = mounts[leg - 1].filter((mt) => fwd[leg - 1][mt.entry] && loc[leg][mt.exit] >= 0);
        exits[leg - 1] = usable;
        ends = usable.map((mt) => mt.entry);
      }
    }
    // Station mounts must also start from a face relevant in their own leg.
    for (let leg = 0; leg < S; leg++) exits[leg] = exits[leg].filter((mt) => loc[leg][mt.entry] >= 0);
  }

  return {
    req, model, faces, S, stations, start, mounts, camEntry,
    camLen: req.camera.lengthMm, camAdj: Math.max(0, req.camera.adjustMm ?? 0),
    target, tol, lo, hi, filterShift,
    maxParts: Math.max(0, Math.floor(req.maxParts ?? DEFAULT_MAX_PARTS)),
    maxSolutions: Math.max(1, Math.floor(req.maxSolutions ?? DEFAULT_MAX_SOLUTIONS)),
    rel, loc, exits, blockedLeg, fwd,
    work: { left: WORK_LIMIT, exhausted: false },
  };
}

/** True when some chain mates, ignoring quantity and maxParts. */
export function connectable(p: Problem): boolean {
  return p.blockedLeg < 0 && p.start >= 0 && p.loc[0][p.start] >= 0;
}
