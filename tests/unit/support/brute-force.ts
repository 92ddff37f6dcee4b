// An independent, deliberately naive reading of SOLVER.md: enumerate every chain (every
// order, every orientation, every leg) within maxParts and stock, then apply the contract's
// rules to the whole list. Exponential; meant for catalogs of a handful of parts.
import type { Camera, Gender, Optics, Part, Port, SolveRequest } from "@/lib/solver";

export type OracleChain = {
  items: { part: Part; role: "connector" | "station" | "camera"; reversed: boolean; joint: string }[];
  dMin: number;
  dMax: number;
  partCount: number;
  price: number | null;
  multiset: string;
};

/** One multiset in its best ordering, with every part of the v2 ranking key. */
export type OracleSolution = {
  multiset: string; geometry: string; k: number; err: number | null; price: number | null; d: number;
  warned: boolean; detours: number;
};

export type Oracle = {
  status: "ok" | "no-connection" | "too-long" | "out-of-reach";
  target: number | null;
  tol: number | null;
  filterShift: number;
  chains: OracleChain[];
  shortestD: number | null;
  /** Every distinct multiset in the window (or every one without a target), best first. */
  ranked: OracleSolution[];
  /** Per geometry, best first (a geometry ranks as its best multiset): its multisets, best first. */
  geometries: OracleSolution[][];
  nearest: { belowMm: number | null; aboveMm: number | null } | null;
};

const SLACK = 1e-6;

const mates = (open: Port, front: Port | null) =>
  !!front && open.interface === front.interface && open.gender !== front.gender;

function orientations(p: Part): { front: Port | null; rear: Port | null; reversed: boolean }[] {
  const out = [{ front: p.front, rear: p.rear, reversed: false }];
  const same = p.front && p.rear && p.front.interface === p.rear.interface && p.front.gender === p.rear.gender;
  if (p.reversible && !same) out.push({ front: p.rear, rear: p.front, reversed: true });
  return out;
}

export function multisetOf(ids: string[]): string {
  return [...ids].sort().join("|");
}

export function enumerateChains(req: SolveRequest): OracleChain[] {
  const maxParts = req.maxParts ?? 10;
  const stations = req.stations ?? [];
  const out: OracleChain[] = [];
  const used = new Map<number, number>();
  const path: OracleChain["items"] = [];

  const finish = () => {
    const items = [...path, { part: req.camera, role: "camera" as const, reversed: false, joint: req.camera.front!.interface }];
    let dMin = 0, dMax = 0, price: number | null = 0, partCount = 0;
    const ids: string[] = [];
    for (const it of items) {
      dMin += it.part.lengthMm;
      dMax += it.part.lengthMm + (it.part.adjustMm ?? 0);
      if (it.role === "connector") {
        partCount++;
        ids.push(it.part.id);
        price = price === null || it.part.priceCents === undefined ? null : price + it.part.priceCents;
      }
    }
    out.push({ items, dMin, dMax, partCount, price, multiset: multisetOf(ids) });
  };

  const step = (open: Port | null, leg: number, count: number) => {
    if (!open) return;
    if (leg === stations.length && mates(open, req.camera.front)) finish();
    if (leg < stations.length) {
      for (const o of orientations(stations[leg])) {
        if (!o.rear || !mates(open, o.front)) continue;
        path.push({ part: stations[leg], role: "station", reversed: o.reversed, joint: o.front!.interface });
        step(o.rear, leg + 1, count);
        path.pop();
      }
    }
    if (count >= maxParts) return;
    req.parts.forEach((part, i) => {
      const q = part.quantity ?? Infinity;
      if ((used.get(i) ?? 0) >= q) return;
      for (const o of orientations(part)) {
        if (!o.rear || !mates(open, o.front)) continue;
        used.set(i, (used.get(i) ?? 0) + 1);
        path.push({ part, role: "connector", reversed: o.reversed, joint: o.front!.interface });
        step(o.rear, leg, count + 1);
        path.pop();
        used.set(i, used.get(i)! - 1);
      }
    });
  };
  step(req.optics.rear, 0, 0);
  return out;
}

const priceKey = (p: number | null) => (p === null ? Infinity : p);

/** The v2 key: warned, parts, detours, |error|, price (unknown last), D. */
export function compareSolutions(a: OracleSolution, b: OracleSolution, eps = 1e-9): number {
  if (a.warned !== b.warned) return a.warned ? 1 : -1;
  if (a.k !== b.k) return a.k - b.k;
  if (a.detours !== b.detours) return a.detours - b.detours;
  const ea = a.err === null ? 0 : Math.abs(a.err), eb = b.err === null ? 0 : Math.abs(b.err);
  if (Math.abs(ea - eb) > eps) return ea - eb;
  if (priceKey(a.price) !== priceKey(b.price)) return priceKey(a.price) < priceKey(b.price) ? -1 : 1;
  if (Math.abs(a.d - b.d) > eps) return a.d - b.d;
  return 0;
}

const portText = (p: Port | null) => (p ? `${p.interface}/${p.gender}` : "-");
/** Contract v2 §3: equivalent parts share front port, rear port, lengthMm and adjustMm (absent = 0). */
export const geometryOfPart = (p: Part) => `${portText(p.front)}>${portText(p.rear)}@${p.lengthMm}+${p.adjustMm ?? 0}`;

/** Warned (vignetting or load) and detours of one ordering, with D set as the contract says. */
function judge(req: SolveRequest, c: OracleChain, target: number | null): { d: number; warned: boolean; detours: number } {
  // Adjustable parts take up the distance to the target in sky-to-sensor order.
  let extra = target === null ? 0 : Math.min(Math.max(target, c.dMin), c.dMax) - c.dMin;
  const starts: number[] = [];
  let at = 0;
  for (const it of c.items) {
    const take = Math.min(it.part.adjustMm ?? 0, extra);
    extra -= take;
    starts.push(at);
    at += it.part.lengthMm + take;
  }
  const D = at;
  let warned = false;
  const N = req.optics.focalRatio, s = req.camera.sensorDiagonalMm;
  if (N !== undefined && N > 0 && s !== undefined && s >= 0) {
    const need = (d: number) => s + d / N;
    if (req.optics.clearApertureMm !== undefined && req.optics.clearApertureMm < need(D) - 1e-9) warned = true;
    c.items.forEach((it, i) => {
      if (it.part.clearApertureMm !== undefined && it.part.clearApertureMm < need(Math.max(0, D - starts[i])) - 1e-9) warned = true;
    });
  }
  if (req.optics.maxLoadG !== undefined && c.items.reduce((w, it) => w + (it.part.weightG ?? 0), 0) > req.optics.maxLoadG + 1e-9) warned = true;
  // Detours, leg by leg: a joint that leaves the previous interface for one already used in the leg.
  let detours = 0;
  let leg: string[] = [];
  for (const it of c.items) {
    if (leg.length > 0 && it.joint !== leg[leg.length - 1] && leg.includes(it.joint)) detours++;
    leg.push(it.joint);
    if (it.role !== "connector") leg = [];
  }
  return { d: D, warned, detours };
}

const contains = (big: string[], small: string[]) => {
  const left = [...big];
  for (const x of small) {
    const i = left.indexOf(x);
    if (i < 0) return false;
    left.splice(i, 1);
  }
  return true;
};

export function bruteForce(req: SolveRequest): Oracle {
  const filterShift = (req.filters ?? []).reduce((s, f) => {
    const n = f.refractiveIndex ?? 1.5;
    return s + (f.thicknessMm * (n - 1)) / n;
  }, 0);
  const bf = req.optics.backFocusMm;
  const target = bf === undefined ? null : bf + filterShift;
  const tol = target === null ? null : (req.optics.backFocusToleranceMm ?? 0.5);
  const chains = enumerateChains(req);
  const base = { target, tol, filterShift, chains };
  if (chains.length === 0) return { ...base, status: "no-connection", shortestD: null, ranked: [], geometries: [], nearest: null };
  const shortestD = Math.min(...chains.map((c) => c.dMin));

  // Every multiset in its best ordering by the full key.
  const best = new Map<string, OracleSolution>();
  for (const c of chains) {
    const { d, warned, detours } = judge(req, c, target);
    let err: number | null = null;
    if (target !== null) {
      err = d - target;
      if (Math.abs(err) > tol! + SLACK) continue;
    }
    const geometry = c.items.filter((it) => it.role === "connector").map((it) => geometryOfPart(it.part)).sort().join("|");
    const s: OracleSolution = { multiset: c.multiset, geometry, k: c.partCount, err, price: c.price, d, warned, detours };
    const prev = best.get(c.multiset);
    if (!prev || compareSolutions(s, prev) < 0) best.set(c.multiset, s);
  }
  let ranked = [...best.values()].sort(compareSolutions);
  if (target === null) {
    // No back focus, no padding: drop a multiset containing every part of a better-ranked one.
    const parts = (m: string) => (m === "" ? [] : m.split("|"));
    ranked = ranked.filter((b) => !ranked.some((a) => a !== b && compareSolutions(a, b) < 0 && a.k < b.k && contains(parts(b.multiset), parts(a.multiset))));
  }
  const byGeometry = new Map<string, OracleSolution[]>();
  for (const s of ranked) {
    const list = byGeometry.get(s.geometry) ?? [];
    list.push(s);
    byGeometry.set(s.geometry, list);
  }
  const geometries = [...byGeometry.values()]; // in order of each geometry's best multiset

  const done = { ...base, shortestD, ranked, geometries, nearest: null };
  if (target === null) return { ...done, status: "ok" };
  const lo = target - tol! - SLACK, hi = target + tol! + SLACK;
  if (shortestD > hi) return { ...done, status: "too-long" };
  if (ranked.length > 0) return { ...done, status: "ok" };
  const below = chains.filter((c) => c.dMax < lo).map((c) => c.dMax);
  const above = chains.filter((c) => c.dMin > hi).map((c) => c.dMin);
  return {
    ...done, status: "out-of-reach",
    nearest: { belowMm: below.length ? Math.max(...below) : null, aboveMm: above.length ? Math.min(...above) : null },
  };
}

/**
 * Everything a returned chain must satisfy on its own, checked from the request alone.
 * Returns the problems found (empty when the chain is sound).
 */
export function chainProblems(req: SolveRequest, chain: import("@/lib/solver").Chain, target: number | null, setting: "target" | "min"): string[] {
  const problems: string[] = [];
  const stations = req.stations ?? [];
  const byId = new Map(req.parts.map((p) => [p.id, p]));
  let open: Port | null = req.optics.rear;
  let at = 0, stationIndex = 0, partCount = 0, price: number | null = 0;
  const uses = new Map<string, number>();
  let dMin = 0, dMax = 0;
  chain.steps.forEach((s, i) => {
    const last = i === chain.steps.length - 1;
    let part: Part | undefined;
    if (s.role === "camera") {
      part = req.camera;
      if (!last) problems.push(`camera at step ${i} is not last`);
    } else if (s.role === "station") {
      part = stations[stationIndex];
      if (!part || part.id !== s.partId) problems.push(`station ${s.partId} out of order at step ${i}`);
      stationIndex++;
    } else {
      part = byId.get(s.partId);
      partCount++;
      uses.set(s.partId, (uses.get(s.partId) ?? 0) + 1);
      price = price === null || part?.priceCents === undefined ? null : price + part.priceCents;
    }
    if (!part) { problems.push(`unknown part ${s.partId}`); return; }
    if (s.reversed && s.role !== "station" && s.role !== "connector") problems.push(`step ${i} reversed`);
    if (s.reversed && !part.reversible) problems.push(`${part.id} reversed but not reversible`);
    const front = s.reversed ? part.rear : part.front;
    const rear = s.reversed ? part.front : part.rear;
    if (!open || !front || open.interface !== front.interface || open.gender === front.gender) {
      problems.push(`joint ${i} does not mate (${JSON.stringify(open)} → ${JSON.stringify(front)})`);
    }
    if (front && s.joint.interface !== front.interface) problems.push(`joint ${i} labelled ${s.joint.interface}`);
    open = rear;
    const adj = part.adjustMm ?? 0;
    if (s.lengthMm < part.lengthMm - 1e-9 || s.lengthMm > part.lengthMm + adj + 1e-9) problems.push(`step ${i} length ${s.lengthMm} outside its range`);
    if (setting === "min" && Math.abs(s.lengthMm - part.lengthMm) > 1e-9) problems.push(`step ${i} not at its minimum`);
    if (Math.abs(s.startMm - at) > 1e-9) problems.push(`step ${i} starts at ${s.startMm}, expected ${at}`);
    at += s.lengthMm;
    dMin += part.lengthMm;
    dMax += part.lengthMm + adj;
  });
  if (chain.steps.at(-1)?.role !== "camera") problems.push("no camera at the end");
  if (stationIndex !== stations.length) problems.push(`${stationIndex} of ${stations.length} stations`);
  if (Math.abs(chain.sensorDistanceMm - at) > 1e-9) problems.push(`D ${chain.sensorDistanceMm} ≠ Σ ${at}`);
  if (chain.partCount !== partCount) problems.push(`partCount ${chain.partCount} ≠ ${partCount}`);
  if (partCount > (req.maxParts ?? 10)) problems.push(`more than maxParts`);
  if (chain.priceCents !== price) problems.push(`price ${chain.priceCents} ≠ ${price}`);
  for (const [id, n] of uses) {
    const q = byId.get(id)?.quantity;
    if (q !== undefined && n > q) problems.push(`${id} used ${n} times, ${q} in stock`);
  }
  if (target === null) {
    if (chain.errorMm !== null) problems.push("errorMm should be null");
  } else {
    if (chain.errorMm === null || Math.abs(chain.errorMm - (at - target)) > 1e-9) problems.push(`errorMm ${chain.errorMm} ≠ D − T`);
    if (setting === "target") {
      const want = Math.min(Math.max(target, dMin), dMax);
      if (Math.abs(at - want) > 1e-6) problems.push(`D ${at} is not the setting nearest the target (${want})`);
    }
  }
  return problems;
}

// ---- Builders for hand-made trade cases (invented parts, real interface codes). ----


export const T2 = "M42x0.75";
export const M42x1 = "M42x1";
export const M48 = "M48x0.75";
export const SCT = "2in-24tpi";

export const port = (iface: string, gender: Gender): Port => ({ interface: iface, gender });
export const male = (iface: string) => port(iface, "male");
export const female = (iface: string) => port(iface, "female");

export function part(id: string, front: Port | null, rear: Port | null, lengthMm: number, extra: Partial<Part> = {}): Part {
  return { id, name: extra.name ?? id, front, rear, lengthMm, ...extra };
}

/** A spacer on one thread: female towards the sky, male towards the sensor. */
export const spacer = (id: string, iface: string, lengthMm: number, extra: Partial<Part> = {}) =>
  part(id, female(iface), male(iface), lengthMm, extra);

export function corrector(extra: Partial<Optics> = {}): Optics {
  return { id: "corrector", name: "Field flattener", front: null, rear: male(M48), lengthMm: 0, backFocusMm: 55, ...extra };
}

export function camera(extra: Partial<Camera> = {}): Camera {
  return { id: "camera", name: "Cooled camera", front: female(T2), rear: null, lengthMm: 17.5, ...extra };
}
