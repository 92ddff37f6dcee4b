// The solver against published spacing rules and the trade's worked cases.
import { describe, expect, it } from "vitest";
import { getInterface } from "@/lib/interfaces";
import { solveTrain, type SolveRequest } from "@/lib/solver";
import { camera, corrector, female, M42x1, M48, male, part, spacer, T2 } from "../unit/support/brute-force";

const T_FLANGE = 55; // Source: Wikipedia, "T-mount"; C. Hoffman — T-mount flange focal distance 55.0 mm.

describe("T-mount spacing", () => {
  it("registers T-thread as M42 × 0.75 with a 55 mm flange distance", () => {
    // Source: Wikipedia, "T-mount"; C. Hoffman, "Useful Optomechanical Shop Data".
    expect(getInterface(T2)).toMatchObject({ diameterMm: 42, pitchMm: 0.75, flangeFocalMm: T_FLANGE });
  });

  it("lands exactly on 55 mm with an adapter of 55 − the body's flange distance", () => {
    // Source: Wikipedia, "T-mount" (adapter length rule); Micro Four Thirds 19.25 mm —
    // Wikipedia, "Micro Four Thirds system"; M42 screw mount 45.46 mm — Wikipedia, "M42 lens mount".
    for (const [mount, flange] of [["bayonet-mft", 19.25], [M42x1, 45.46]] as const) {
      expect(getInterface(mount)?.flangeFocalMm).toBe(flange);
      const req: SolveRequest = {
        optics: { id: "t-optics", front: null, rear: male(T2), lengthMm: 0, backFocusMm: T_FLANGE, backFocusToleranceMm: 0.05 },
        camera: { id: "body", front: female(mount), rear: null, lengthMm: flange },
        parts: [
          part("t-adapter", female(T2), male(mount), T_FLANGE - flange),
          part("t-adapter-long", female(T2), male(mount), T_FLANGE - flange + 1),
        ],
      };
      const res = solveTrain(req);
      expect(res.status).toBe("ok");
      expect(res.solutions.map((s) => s.steps[0].partId)).toEqual(["t-adapter"]);
      expect(res.solutions[0].sensorDistanceMm).toBeCloseTo(T_FLANGE, 9);
      expect(res.solutions[0].errorMm).toBeCloseTo(0, 9);
    }
  });
});

describe("M42 × 1 is not T-thread", () => {
  it("never mates M42 × 0.75, in either gender", () => {
    // Source: Wikipedia, "M42 lens mount"; C. Hoffman — same diameter, different pitch.
    const res = solveTrain({
      optics: { id: "t-optics", name: "T-thread corrector", front: null, rear: male(T2), lengthMm: 0, backFocusMm: 55 },
      camera: { id: "m42-body", name: "M42 screw-mount body", front: female(M42x1), rear: null, lengthMm: 45.46 },
      parts: [spacer("t-spacer", T2, 5), spacer("m42-spacer", M42x1, 5), part("odd", male(M42x1), female(T2), 1)],
    });
    expect(res.status).toBe("no-connection");
    expect(res.reason).toBe("Nothing available joins the M42x0.75 male rear of T-thread corrector to the M42x1 female front of M42 screw-mount body.");
  });
});

describe("worked trade cases", () => {
  it("a 55 mm corrector with a 2 mm filter wants about 55.7 mm", () => {
    // Source: common practice (a third of the glass thickness); n = 1.5 by default, N-BK7 gives 55.68.
    const parts = [part("a48", female(M48), male(T2), 5), spacer("s10", T2, 10), spacer("s20", T2, 20), spacer("s3", T2, 3), spacer("s07", T2, 0.7)];
    const res = solveTrain({ optics: corrector(), camera: camera(), filters: [{ thicknessMm: 2 }], parts });
    expect(res.targetMm).toBeCloseTo(55.7, 1);
    expect(res.toleranceMm).toBe(0.5); // common practice: about ±0.5 mm for fast systems
    const best = res.solutions[0];
    expect(Math.abs(best.errorMm!)).toBeLessThanOrEqual(0.5);
    // 5 + 17.5 = 22.5 mm before spacers; 33 mm of them (s20 + s10 + s3) gives 55.5 mm, 0.17 mm short.
    expect(best.steps.map((s) => s.partId).sort()).toEqual(["a48", "camera", "s10", "s20", "s3"]);
    expect(best.sensorDistanceMm).toBeCloseTo(55.5, 9);
    const bk7 = solveTrain({ optics: corrector(), camera: camera(), filters: [{ thicknessMm: 2, refractiveIndex: 1.5168 }], parts });
    expect(bk7.targetMm).toBeCloseTo(55.681, 3);
  });

  it("a filter wheel with female T-threads on both faces needs a male–male coupler before a female camera", () => {
    // Source: common practice (filter wheels are often female M42 × 0.75 on both faces).
    const wheel = part("wheel", female(T2), female(T2), 20, { name: "Filter wheel" });
    const base: SolveRequest = { optics: { ...corrector(), rear: male(T2), backFocusMm: 39.5 }, camera: camera(), stations: [wheel], parts: [] };
    expect(solveTrain(base).status).toBe("no-connection");
    const res = solveTrain({ ...base, parts: [part("coupler", male(T2), male(T2), 2, { name: "T coupler" })] });
    expect(res.status).toBe("ok");
    expect(res.solutions[0].steps.map((s) => s.partId)).toEqual(["wheel", "coupler", "camera"]);
    expect(res.solutions[0].sensorDistanceMm).toBe(39.5);
  });
});
