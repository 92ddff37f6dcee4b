// lib/optics and lib/units: behaviour at the edges (the published values live in tests/reference).
import { describe, expect, it } from "vitest";
import { criticalFocusZoneUm, farthestUnvignettedMm, fieldOfViewDeg, filterShiftMm, focalRatio, inchesToMm, mmToInches, plateScaleArcsecPerPixel,
  requiredClearApertureMm, sensorDiagonal, totalFilterShiftMm } from "@/lib/optics";
import { formatLength, formatMm } from "@/lib/units";

describe("optics", () => {
  it("defaults the refractive index to 1.5 and adds shifts of several plates", () => {
    expect(filterShiftMm(1.5)).toBeCloseTo(0.5, 12);
    expect(totalFilterShiftMm([])).toBe(0);
    expect(totalFilterShiftMm([{ thicknessMm: 3 }, { thicknessMm: 1.5, refractiveIndex: 1.5 }])).toBeCloseTo(1.5, 12);
    expect(filterShiftMm(2, 1)).toBe(0); // n = 1: no glass, no shift
  });

  it("refuses nonsense instead of returning a number", () => {
    expect(() => filterShiftMm(-1)).toThrow(RangeError);
    expect(() => filterShiftMm(1, 0.9)).toThrow(RangeError);
    expect(() => requiredClearApertureMm(20, 10, 0)).toThrow(RangeError);
    expect(() => plateScaleArcsecPerPixel(3.76, 0)).toThrow(RangeError);
    expect(() => focalRatio(500, 0)).toThrow(RangeError);
    expect(() => criticalFocusZoneUm(Number.NaN)).toThrow(RangeError);
  });

  it("grows the critical focus zone with the square of the focal ratio", () => {
    expect(criticalFocusZoneUm(10) / criticalFocusZoneUm(5)).toBeCloseTo(4, 12);
    expect(criticalFocusZoneUm(4, 0.656)).toBeCloseTo(4.88 * 0.656 * 16, 12);
  });

  it("places a part as far from the sensor as its aperture allows, the inverse of the aperture it needs", () => {
    // 36 mm clear at f/5 with a 28.3 mm diagonal: (36 − 28.3)·5 = 38.5 mm, and there it needs exactly 36 mm.
    expect(farthestUnvignettedMm(36, 28.3, 5)).toBeCloseTo(38.5, 12);
    expect(requiredClearApertureMm(28.3, farthestUnvignettedMm(36, 28.3, 5), 5)).toBeCloseTo(36, 12);
    expect(farthestUnvignettedMm(20, 28.3, 5)).toBeLessThan(0); // narrower than the sensor: vignettes anywhere
    expect(() => farthestUnvignettedMm(36, 28.3, 0)).toThrow(RangeError);
  });

  it("has the field shrink as focal length grows, and focal ratio as focal / aperture", () => {
    expect(fieldOfViewDeg(23.5, 1000)).toBeLessThan(fieldOfViewDeg(23.5, 500));
    expect(fieldOfViewDeg(0, 500)).toBe(0);
    expect(focalRatio(400, 80)).toBe(5);
    expect(sensorDiagonal(3, 4)).toBe(5);
    expect(mmToInches(inchesToMm(3.25))).toBeCloseTo(3.25, 12);
  });
});

describe("units", () => {
  it("formats millimetres to 0.1 mm", () => {
    expect(formatMm(55.666)).toBe("55.7 mm");
    expect(formatMm(0)).toBe("0.0 mm");
    expect(formatMm(-0.04)).toBe("0.0 mm");
    expect(formatMm(-1.25)).toBe("-1.3 mm");
    expect(formatMm(Number.NaN)).toBe("—");
  });

  it("formats in inches on request", () => {
    expect(formatLength(50.8, "in")).toBe("2.000 in");
    expect(formatLength(55.7)).toBe("55.7 mm");
    expect(formatLength(31.75, "mm")).toBe("31.8 mm");
  });
});
