// The demo catalog must hold up to an expert's reading: every corrector can be carried by some
// telescope in the catalog, a part that claims a use ("for f/7 triplets", "for Newtonians")
// mates with what it claims, and no optic claims an image circle wider than its own rear
// opening can pass at its back focus by the product's own no-vignetting rule.
import { describe, expect, it } from "vitest";
import { CONNECTOR_KINDS } from "@/lib/catalog/to-solver";
import { requiredClearApertureMm } from "@/lib/optics";
import { solveTrain, type Part } from "@/lib/solver";
import type { PartInput } from "@/lib/validation/parts";
import { demoCatalog } from "@/seed/catalog";
import { BORE_MM } from "@/seed/catalog/makers";

const toPart = (p: PartInput): Part => ({
  id: p.slug!, front: p.front ?? null, rear: p.rear ?? null, lengthMm: p.lengthMm, adjustMm: p.adjustMm, reversible: p.reversible,
});
const connectors = demoCatalog.filter((p) => CONNECTOR_KINDS.has(p.kind)).map(toPart);
const telescopes = demoCatalog.filter((p) => p.specs?.opticsRole === "telescope");
const correctors = demoCatalog.filter((p) => p.specs?.opticsRole === "corrector");
const astrographs = demoCatalog.filter((p) => p.specs?.opticsRole === "astrograph");
const fRatio = (t: PartInput) => t.specs!.focalLengthMm! / t.specs!.apertureMm!;
const name = (p: PartInput) => `${p.maker} ${p.model}`;

/** Can this telescope carry this corrector, directly or through catalog adapters (as the planner asks)? */
function carries(t: PartInput, c: PartInput, parts: Part[] = connectors): boolean {
  const link = solveTrain({ optics: { ...toPart(t), lengthMm: 0 }, camera: { ...toPart(c), rear: null, lengthMm: 0 }, parts, maxParts: 6, maxSolutions: 1 });
  return link.status === "ok";
}

/** The telescopes a corrector's description claims it is for; null when it claims nothing specific. */
function claimed(c: PartInput): PartInput[] | null {
  const d = c.description ?? "";
  const range = d.match(/f\/(\d+(?:\.\d+)?)(?:–f\/(\d+(?:\.\d+)?))? (doublets|triplets|Newtonians)/);
  if (range) {
    const lo = Number(range[1]), hi = Number(range[2] ?? range[1]);
    const kind = { doublets: /\bED\b/, triplets: /Triplet/, Newtonians: /Newtonian/ }[range[3] as "doublets" | "triplets" | "Newtonians"];
    return telescopes.filter((t) => kind.test(t.model) && fRatio(t) >= lo - 0.25 && fRatio(t) <= hi + 0.25);
  }
  if (/Newtonian/.test(d)) return telescopes.filter((t) => /Newtonian/.test(t.model));
  if (/\bSCTs?\b/.test(d)) return telescopes.filter((t) => /SCT/.test(t.model));
  return null;
}

describe("catalog consistency", () => {
  it("every corrector can be carried by some catalog telescope", () => {
    for (const c of correctors) expect(telescopes.some((t) => carries(t, c)), name(c)).toBe(true);
  });

  it("a corrector that claims a kind of telescope mates with every one of them, and the claim names some", () => {
    for (const c of correctors) {
      const claim = claimed(c);
      if (claim === null) continue;
      expect(claim.length, `${name(c)} claims "${c.description}" but the catalog has none`).toBeGreaterThan(0);
      for (const t of claim) expect(carries(t, c), `${name(c)} on the ${name(t)}`).toBe(true);
    }
  });

  it("no optic's clear aperture is wider than the bore of its own rear thread", () => {
    for (const o of [...correctors, ...astrographs]) {
      if (o.clearApertureMm === undefined || !o.rear) continue;
      expect(o.clearApertureMm, name(o)).toBeLessThanOrEqual(BORE_MM[o.rear.interface as keyof typeof BORE_MM]!);
    }
  });

  it("no optic claims an image circle wider than its rear opening passes at its back focus", () => {
    // Rule: a circle of diameter s is lit without vignetting through an opening of clear
    // aperture A at distance d from the focal plane when A ≥ s + d/N (lib/optics, common practice).
    const checks: { optic: PartInput; N: number }[] = [];
    for (const c of correctors) {
      const claim = claimed(c);
      // Claimed telescopes, else every telescope it mates directly (no adapters).
      const on = (claim ?? telescopes.filter((t) => carries(t, c, []))).filter((t) => carries(t, c));
      expect(on.length, name(c)).toBeGreaterThan(0);
      checks.push({ optic: c, N: Math.min(...on.map(fRatio)) * (c.specs!.reduction ?? 1) });
    }
    for (const a of astrographs) checks.push({ optic: a, N: fRatio(a) });
    for (const { optic, N } of checks) {
      const s = optic.specs!;
      expect(optic.clearApertureMm, `${name(optic)} publishes a rear clear aperture`).toBeDefined();
      const need = requiredClearApertureMm(s.imageCircleMm!, s.backFocusMm!, N);
      expect(optic.clearApertureMm!, `${name(optic)}: a ${s.imageCircleMm} mm circle at ${s.backFocusMm} mm and f/${N.toFixed(2)} needs ${need.toFixed(1)} mm`)
        .toBeGreaterThanOrEqual(need - 1e-9);
    }
  });
});
