// Synthetic catalogs for the solver benchmark: seeded, so every run measures the same parts.
// Two shapes: "trade" looks like a real catalog (many spacers in stock lengths, adapters
// between popular threads, a few couplers and adjustable parts); "uniform" draws every face
// at random over all interfaces, a denser and less friendly graph.
import type { Part, Port, SolveRequest } from "../../lib/solver";

export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const INTERFACE_COUNT = 40;
export const iface = (i: number) => `IF${String(i).padStart(2, "0")}`;
const STOCK_LENGTHS = [0.5, 1, 2, 3, 5, 7.5, 10, 12.5, 15, 16.5, 20, 25, 30, 40];

export type Shape = "trade" | "uniform";

export function makeCatalog(n: number, shape: Shape, seed = 42): Part[] {
  const r = rng(seed + n);
  const pick = <T,>(xs: readonly T[]) => xs[Math.floor(r() * xs.length)];
  // Popular threads first: interface i is drawn with weight 1 / (i + 1).
  const weights = Array.from({ length: INTERFACE_COUNT }, (_, i) => 1 / (i + 1));
  const total = weights.reduce((a, b) => a + b, 0);
  const popular = () => {
    let x = r() * total;
    for (let i = 0; i < weights.length; i++) {
      x -= weights[i];
      if (x <= 0) return iface(i);
    }
    return iface(INTERFACE_COUNT - 1);
  };
  const anyIface = () => iface(Math.floor(r() * INTERFACE_COUNT));
  const gender = (): Port["gender"] => (r() < 0.5 ? "male" : "female");
  const tenth = (lo: number, hi: number) => Math.round((lo + r() * (hi - lo)) * 10) / 10;
  const parts: Part[] = [];
  for (let i = 0; i < n; i++) {
    const base = {
      id: `part-${i}`,
      name: `Part ${i}`,
      quantity: r() < 0.5 ? undefined : 1 + Math.floor(r() * 5),
      priceCents: r() < 0.1 ? undefined : 500 + Math.floor(r() * 100) * 50,
      clearApertureMm: 30 + Math.floor(r() * 40),
      weightG: 20 + Math.floor(r() * 200),
    };
    if (shape === "uniform") {
      parts.push({ ...base, front: { interface: anyIface(), gender: gender() }, rear: { interface: anyIface(), gender: gender() },
        lengthMm: tenth(0, 40), reversible: r() < 0.2, adjustMm: r() < 0.05 ? tenth(2, 15) : undefined });
      continue;
    }
    const kind = r();
    if (kind < 0.45) {
      const t = popular();
      parts.push({ ...base, front: { interface: t, gender: "female" }, rear: { interface: t, gender: "male" },
        lengthMm: r() < 0.7 ? pick(STOCK_LENGTHS) : tenth(0.5, 30) });
    } else if (kind < 0.85) {
      const a = popular();
      let b = popular();
      if (b === a) b = anyIface();
      const fg = r() < 0.8 ? "female" : "male", rg = r() < 0.8 ? "male" : "female";
      parts.push({ ...base, front: { interface: a, gender: fg }, rear: { interface: b, gender: rg }, lengthMm: tenth(0, 25), reversible: r() < 0.1 });
    } else if (kind < 0.95) {
      const t = popular(), g = gender();
      parts.push({ ...base, front: { interface: t, gender: g }, rear: { interface: t, gender: g }, lengthMm: tenth(1, 8), reversible: true });
    } else {
      const t = popular();
      parts.push({ ...base, front: { interface: t, gender: "female" }, rear: { interface: r() < 0.7 ? t : popular(), gender: "male" },
        lengthMm: tenth(10, 30), adjustMm: tenth(3, 15) });
    }
  }
  return parts;
}

/** Requests on one catalog: two stations, a 55 mm target, varied faces so no two are alike. */
export function makeRequests(parts: Part[], count: number, seed = 7): SolveRequest[] {
  const r = rng(seed);
  const top = (k: number) => iface(Math.floor(r() * k));
  const out: SolveRequest[] = [];
  for (let i = 0; i < count; i++) {
    const a = top(4), b = top(4), c = top(4);
    out.push({
      optics: { id: `flattener-${i}`, name: "Flattener", front: null, rear: { interface: top(6), gender: "male" }, lengthMm: 0,
        backFocusMm: 55, backFocusToleranceMm: r() < 0.5 ? 0.5 : 0.25, focalRatio: 5, imageCircleMm: 44, maxLoadG: 3000 },
      camera: { id: `camera-${i}`, name: "Camera", front: { interface: c, gender: "female" }, rear: null,
        lengthMm: [6.5, 12.5, 17.5][i % 3], sensorDiagonalMm: 28.3, clearApertureMm: 40, weightG: 700 },
      stations: [
        { id: "oag", name: "Off-axis guider", front: { interface: a, gender: "female" }, rear: { interface: b, gender: "male" }, lengthMm: 9 + (i % 4), clearApertureMm: 36, weightG: 200 },
        { id: "wheel", name: "Filter wheel", front: { interface: b, gender: "female" }, rear: { interface: c, gender: "female" }, lengthMm: 20, reversible: true, clearApertureMm: 42, weightG: 450 },
      ],
      filters: [{ thicknessMm: 2, refractiveIndex: 1.5168 }],
      parts,
    });
  }
  return out;
}
