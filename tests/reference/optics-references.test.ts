// Published values checked against lib/optics (sources in /work/shared/design/REFERENCES.md).
import { describe, expect, it } from "vitest";
import { getInterface } from "@/lib/interfaces";
import {
  MM_PER_INCH, criticalFocusZoneUm, fieldOfViewDeg, filterShiftMm, inchesToMm, mmToInches, plateScaleArcsecPerPixel,
  requiredClearApertureMm, sensorDiagonal, totalFilterShiftMm,
} from "@/lib/optics";

const N_BK7 = 1.5168; // Source: SCHOTT data as listed on refractiveindex.info (N-BK7 at 587.6 nm)

describe("focus shift of filter glass", () => {
  it("is t·(n − 1)/n: 2 mm of N-BK7 → 0.681 mm, 3 mm → 1.022 mm", () => {
    // Source: W. J. Smith, Modern Optical Engineering, §7.8 (plane-parallel plate), with the N-BK7 index above.
    expect(filterShiftMm(2, N_BK7)).toBeCloseTo(0.681, 3);
    expect(filterShiftMm(3, N_BK7)).toBeCloseTo(1.022, 3);
    expect(totalFilterShiftMm([{ thicknessMm: 2, refractiveIndex: N_BK7 }, { thicknessMm: 3, refractiveIndex: N_BK7 }])).toBeCloseTo(1.704, 3);
  });

  it("is about a third of the thickness for ordinary glass (n ≈ 1.5)", () => {
    // Source: common practice ("add about one third of the filter's thickness").
    expect(filterShiftMm(3)).toBeCloseTo(1, 12);
    expect(filterShiftMm(2)).toBeCloseTo(2 / 3, 12);
  });
});

describe("inches", () => {
  it("are 25.4 mm exactly, which makes 1.25-inch and 2-inch barrels 31.75 and 50.8 mm", () => {
    // Source: International yard and pound agreement (1959); NIST Handbook 44, App. C.
    expect(MM_PER_INCH).toBe(25.4);
    expect(inchesToMm(1)).toBe(25.4);
    expect(mmToInches(50.8)).toBeCloseTo(2, 12);
    // Source: C. Hoffman, "Useful Optomechanical Shop Data" (eyepiece barrels).
    expect(inchesToMm(1.25)).toBeCloseTo(31.75, 12);
    expect(inchesToMm(2)).toBeCloseTo(50.8, 12);
    expect(getInterface("barrel-1.25in")?.diameterMm).toBeCloseTo(31.75, 12);
    expect(getInterface("barrel-2in")?.diameterMm).toBeCloseTo(50.8, 12);
  });

  it("give the Schmidt–Cassegrain 2\"-24 thread a pitch of 25.4/24 = 1.0583 mm", () => {
    // Source: C. Hoffman, "Useful Optomechanical Shop Data".
    expect(getInterface("2in-24tpi")?.pitchMm).toBeCloseTo(1.0583, 4);
  });
});

describe("sensor, field and focus", () => {
  it("gives a full-frame diagonal of 43.27 mm and a Four Thirds one of 21.6 mm", () => {
    // Source: C. Hoffman (full frame 36 × 24 mm); Wikipedia, "Micro Four Thirds system" (17.3 × 13.0 mm).
    expect(sensorDiagonal(36, 24)).toBeCloseTo(43.27, 2);
    expect(sensorDiagonal(17.3, 13)).toBeCloseTo(21.6, 1);
  });

  it("computes plate scale as 206.265 × pixel (µm) / focal length (mm)", () => {
    // Source: Wikipedia, "Plate scale"; R. N. Clark, "Plate scale".
    expect(plateScaleArcsecPerPixel(3.76, 1000)).toBeCloseTo(0.7756, 4);
    expect(plateScaleArcsecPerPixel(1, 206.265)).toBeCloseTo(1, 5);
  });

  it("computes field of view as 2·atan(s / 2f)", () => {
    // Source: follows from s = f·θ (REFERENCES.md); 36 mm at 50 mm is the familiar 39.6° (from memory).
    expect(fieldOfViewDeg(36, 50)).toBeCloseTo(39.6, 1);
    expect(fieldOfViewDeg(2 * 100 * Math.tan(Math.PI / 180), 100)).toBeCloseTo(2, 10);
  });

  it("uses 4.88·λ·N² for the critical focus zone: f/5 at 0.55 µm → 67 µm", () => {
    // Source: focusing literature as listed in REFERENCES.md (factor 4.88 stated in lib/optics).
    expect(criticalFocusZoneUm(5)).toBeCloseTo(67.1, 1);
  });

  it("asks a part at d before the focal plane for a clear aperture of diagonal + d/N", () => {
    // Source: J. Greivenkamp, Field Guide to Geometrical Optics (vignetting).
    expect(requiredClearApertureMm(43.27, 20, 4)).toBeCloseTo(48.27, 12);
    expect(requiredClearApertureMm(21.6, 0, 2)).toBe(21.6);
  });
});
