import { describe, expect, it } from "vitest";
import { buildOptics, CONNECTOR_KINDS } from "@/lib/catalog/to-solver";
import type { PartRowLike } from "@/lib/catalog/rows";
import { solveTrain } from "@/lib/solver";

const row = (over: Partial<PartRowLike>): PartRowLike => ({
  id: "id", slug: "slug", kind: "optics", maker: "M", model: "X", description: null,
  frontInterface: null, frontGender: null, rearInterface: null, rearGender: null,
  lengthMm: 0, adjustMm: null, reversible: false, clearApertureMm: null, weightG: null, listPriceCents: null,
  specs: {}, status: "approved", ...over,
});

describe("buildOptics", () => {
  const scope = row({ slug: "scope", rearInterface: "barrel-2in", rearGender: "female", specs: { opticsRole: "telescope", focalLengthMm: 480, apertureMm: 80, maxLoadG: 3000 } });
  const flattener = row({ slug: "flat", frontInterface: "barrel-2in", frontGender: "male", rearInterface: "M48x0.75", rearGender: "male", weightG: 420,
    specs: { opticsRole: "corrector", backFocusMm: 55, backFocusToleranceMm: 0.5, reduction: 0.8, imageCircleMm: 44 } });

  it("measures back focus from the corrector and scales the focal length by its factor", () => {
    const { optics, focalLengthMm, focalRatio } = buildOptics(scope, flattener);
    expect(optics.id).toBe("flat");
    expect(optics.rear).toEqual({ interface: "M48x0.75", gender: "male" });
    expect(optics.backFocusMm).toBe(55);
    expect(focalLengthMm).toBeCloseTo(384, 9);   // 480 × 0.8
    expect(focalRatio).toBeCloseTo(4.8, 9);      // 384 / 80
    expect(optics.imageCircleMm).toBe(44);
  });

  it("leaves the focuser only its rating minus the corrector's weight for the rest of the train", () => {
    expect(buildOptics(scope, flattener).optics.maxLoadG).toBe(3000 - 420);
    expect(buildOptics(scope, null).optics.maxLoadG).toBe(3000);
  });

  it("takes a tolerance override over the maker's figure", () => {
    expect(buildOptics(scope, flattener, 0.2).optics.backFocusToleranceMm).toBe(0.2);
  });

  it("fills gaps with adapters, spacers and extensions only", () => {
    expect([...CONNECTOR_KINDS].sort()).toEqual(["adapter", "extension", "spacer"]);
  });
});

describe("a corrector behind a telescope is checked for vignetting", () => {
  // Requirement s + d/N (lib/optics requiredClearApertureMm, common practice).
  const scope = row({ slug: "scope", rearInterface: "barrel-2in", rearGender: "female", specs: { opticsRole: "telescope", focalLengthMm: 480, apertureMm: 80 } });
  const flattener = row({ slug: "flat", frontInterface: "barrel-2in", frontGender: "male", rearInterface: "M48x0.75", rearGender: "male", clearApertureMm: 44,
    specs: { opticsRole: "corrector", backFocusMm: 55, backFocusToleranceMm: 0.5, reduction: 1, imageCircleMm: 44 } });
  const camera = (diag: number) => ({ id: "cam", front: { interface: "M48x0.75", gender: "female" as const }, rear: null, lengthMm: 55, sensorDiagonalMm: diag });

  it("uses the telescope's focal ratio times the corrector's factor at the corrector's own rear", () => {
    const { optics } = buildOptics(scope, flattener);
    expect(optics.focalRatio).toBeCloseTo(6, 9); // 480 × 1.0 / 80; the corrector alone has none
    const full = solveTrain({ optics, camera: camera(43.3), parts: [] });
    const w = full.solutions[0].warnings.find((x) => x.code === "vignetting" && x.partId === "flat");
    expect(w?.message).toContain("needs 52.5 mm at 55.0 mm"); // 43.3 + 55/6 = 52.47
    expect(w?.message).toContain("f/6");
    const small = solveTrain({ optics, camera: camera(28.3), parts: [] }); // 28.3 + 9.2 = 37.5 < 44
    expect(small.solutions[0].warnings.filter((x) => x.code === "vignetting")).toEqual([]);
  });
});
