// Hand-made trade cases: one behaviour of the contract each, with the numbers worked out by
// hand. Invented parts; interface codes and the usual practice of the trade.
import { describe, expect, it } from "vitest";
import { solveTrain, warmCatalog, type Part, type SolveRequest } from "@/lib/solver";
import { chainProblems, camera, corrector, female, M48, male, part, spacer, T2 } from "./support/brute-force";

const adapter48 = part("a48", female(M48), male(T2), 5, { name: "M48 to T adapter", priceCents: 2000 });
const wheel = part("wheel", female(T2), female(T2), 20, { name: "Filter wheel" });
const coupler = part("mm", male(T2), male(T2), 2, { name: "T male-male coupler", priceCents: 900 });

function solve(req: SolveRequest) {
  const res = solveTrain(req);
  for (const c of [res.shortest, ...res.solutions]) {
    if (c) expect(chainProblems(req, c, res.targetMm, c === res.shortest ? "min" : "target")).toEqual([]);
  }
  return res;
}

const ids = (c: { steps: { partId: string }[] }) => c.steps.map((s) => s.partId);

describe("joints", () => {
  it("a wheel with female T-threads on both faces needs a male–male coupler to meet a female camera (common practice)", () => {
    const base = { optics: corrector(), camera: camera(), stations: [wheel] };
    const without = solve({ ...base, parts: [adapter48, spacer("s10", T2, 10)] });
    expect(without.status).toBe("no-connection");
    expect(without.reason).toBe("Nothing available joins the M42x0.75 female rear of Filter wheel to the M42x0.75 female front of Cooled camera.");

    const withCoupler = solve({ ...base, parts: [adapter48, spacer("s10", T2, 10), coupler] });
    expect(withCoupler.shortest && ids(withCoupler.shortest)).toEqual(["a48", "wheel", "mm", "camera"]);
    expect(withCoupler.shortest!.sensorDistanceMm).toBeCloseTo(5 + 20 + 2 + 17.5, 9);
  });

  it("names the first joint nothing can make, from the optics onwards", () => {
    const res = solve({ optics: corrector(), camera: camera(), stations: [wheel], parts: [coupler] });
    expect(res.status).toBe("no-connection");
    expect(res.reason).toBe("Nothing available joins the M48x0.75 male rear of Field flattener to the M42x0.75 female front of Filter wheel.");
    expect(res.shortest).toBeNull();
    expect(res.solutions).toEqual([]);
  });

  it("mounts a reversible part back to front when only that mates, and labels the joint by the face in front", () => {
    const flipped = part("flip", male(T2), female(M48), 6, { reversible: true });
    const res = solve({ optics: corrector({ backFocusMm: undefined }), camera: camera(), parts: [flipped] });
    expect(res.status).toBe("ok");
    const step = res.shortest!.steps[0];
    expect(step).toMatchObject({ partId: "flip", reversed: true, joint: { interface: M48 }, startMm: 0, lengthMm: 6 });
    expect(res.shortest!.steps[1]).toMatchObject({ partId: "camera", joint: { interface: T2 }, startMm: 6 });
  });

  it("counts a symmetric reversible part once (no second, reversed copy of the same chain)", () => {
    const ff = part("ff", female(T2), female(T2), 1, { reversible: true });
    const res = solve({
      optics: { ...corrector({ backFocusMm: undefined }), rear: male(T2) }, camera: { ...camera(), front: male(T2) },
      parts: [ff], maxSolutions: 10,
    });
    expect(res.solutions).toHaveLength(1);
    expect(res.solutions[0].steps[0].reversed).toBe(false);
  });
});

describe("the window", () => {
  const parts: Part[] = [adapter48, coupler, spacer("s1", T2, 1, { priceCents: 800 }), spacer("s5", T2, 5, { priceCents: 1000, quantity: 2 }),
    spacer("s10", T2, 10, { priceCents: 1200 })];
  const req: SolveRequest = { optics: corrector(), camera: camera(), stations: [wheel], filters: [{ thicknessMm: 2 }], parts };

  it("aims at back focus plus a third of the filter glass (2 mm at n = 1.5 → 55.667 mm)", () => {
    const res = solve(req);
    expect(res.filterShiftMm).toBeCloseTo(2 / 3, 12);
    expect(res.targetMm).toBeCloseTo(55 + 2 / 3, 12);
    expect(res.toleranceMm).toBe(0.5);
    expect(res.status).toBe("ok");
    // a48 + wheel + mm + camera = 44.5 mm; the window 55.17–56.17 mm leaves exactly 11 mm of
    // spacers: s10 + s1 (4 parts in all), s5 + s5 + s1 (5), s5 + six s1 (9); eleven s1 exceed 10 parts.
    expect(res.solutions.map((s) => s.partCount)).toEqual([4, 5, 9]);
    expect(res.solutions[0].sensorDistanceMm).toBeCloseTo(55.5, 9);
    expect(res.solutions[0].errorMm).toBeCloseTo(55.5 - (55 + 2 / 3), 9);
    expect(res.solutions[0].priceCents).toBe(2000 + 900 + 800 + 1200);
  });

  it("ranks fewer parts first, then |error|, then price, and reports each multiset once", () => {
    const res = solve({ ...req, maxSolutions: 50 });
    const keys = res.solutions.map((s) => s.steps.filter((x) => x.role === "connector").map((x) => x.partId).sort().join("+"));
    expect(new Set(keys).size).toBe(keys.length);
    for (let i = 1; i < res.solutions.length; i++) {
      const [a, b] = [res.solutions[i - 1], res.solutions[i]];
      const order = a.partCount - b.partCount || Math.abs(a.errorMm!) - Math.abs(b.errorMm!) || (a.priceCents ?? Infinity) - (b.priceCents ?? Infinity);
      expect(order).toBeLessThanOrEqual(1e-9);
    }
    // Stock: s5 has quantity 2, so s5 ×3 never appears.
    for (const k of keys) expect(k.split("+").filter((x) => x === "s5").length).toBeLessThanOrEqual(2);
  });

  it("sets an adjustable part to the length nearest the target and reports that length", () => {
    // A helical M48-to-T adapter, 8 to 18 mm: the rest of the train is 20 + 2 + 17.5 = 39.5 mm.
    const helical = part("helical", female(M48), male(T2), 8, { adjustMm: 10, priceCents: 5000 });
    const res = solve({ ...req, parts: [coupler, helical] });
    expect(res.status).toBe("ok");
    const chain = res.solutions[0];
    expect(ids(chain)).toEqual(["helical", "wheel", "mm", "camera"]);
    expect(chain.steps[0].lengthMm).toBeCloseTo(55 + 2 / 3 - 39.5, 9);
    expect(chain.errorMm).toBeCloseTo(0, 9);
    // The shortest chain keeps it at its minimum.
    expect(res.shortest!.steps[0]).toMatchObject({ partId: "helical", lengthMm: 8 });
    expect(res.shortest!.sensorDistanceMm).toBe(47.5);
  });

  it("spreads the adjustment over several adjustable steps in order", () => {
    const a = part("adj-a", female(T2), male(T2), 2, { adjustMm: 3 });
    const b = part("adj-b", female(T2), male(T2), 2, { adjustMm: 3 });
    const res = solve({ optics: { ...corrector(), rear: male(T2), backFocusMm: 27 }, camera: camera(), parts: [a, b] });
    const chain = res.solutions[0];
    expect(chain.steps.map((s) => s.lengthMm)).toEqual([5, 4.5, 17.5]);
    expect(chain.errorMm).toBe(0);
  });

  it("is too long when even the shortest chain overshoots, saying by how much and what takes the length", () => {
    const res = solve({ ...req, optics: corrector({ backFocusMm: 40 }), filters: [] });
    expect(res.status).toBe("too-long");
    expect(res.solutions).toEqual([]);
    expect(res.shortest!.sensorDistanceMm).toBeCloseTo(44.5, 9);
    expect(res.reason).toBe("Even the shortest chain is 4.0 mm too long: it reaches 44.5 mm against 40.0 mm ± 0.5 mm; " +
      "most of the length is in Filter wheel (20.0 mm), Cooled camera (17.5 mm) and M48 to T adapter (5.0 mm).");
    expect(res.nearest).toEqual({ belowMm: null, aboveMm: res.shortest!.sensorDistanceMm });
  });

  it("is out of reach when chains straddle the window, giving the nearest distances on both sides", () => {
    const res = solve({ ...req, parts: [adapter48, coupler, spacer("s5", T2, 5)], optics: corrector({ backFocusMm: 52, backFocusToleranceMm: 0.25 }), filters: [] });
    expect(res.status).toBe("out-of-reach");
    expect(res.nearest).toEqual({ belowMm: 49.5, aboveMm: 54.5 });
    // The tolerance was given to 0.01 mm, so the sentence keeps that precision (0.25, not 0.3).
    expect(res.reason).toBe("No combination of the available parts lands in 52.00 mm ± 0.25 mm: the closest reachable distances are " +
      "49.50 mm (2.50 mm short of the target) and 54.50 mm (2.50 mm beyond it).");
  });

  it("keeps a ±0.05 mm tolerance and a 0.05 mm miss as given, not rounded away", () => {
    const res = solve({ ...req, parts: [adapter48, coupler, spacer("s5", T2, 5)], optics: corrector({ backFocusMm: 49.6, backFocusToleranceMm: 0.05 }), filters: [] });
    expect(res.status).toBe("out-of-reach");
    expect(res.nearest!.belowMm).toBeCloseTo(49.5, 9);
    expect(res.reason).toContain("49.60 mm ± 0.05 mm");
    expect(res.reason).toContain("49.50 mm (0.10 mm short of the target)");
  });

  it("respects maxParts, and says how many parts a connection would need", () => {
    const far = solve({ ...req, maxParts: 1 });
    expect(far.status).toBe("no-connection");
    expect(far.reason).toBe("Joining Field flattener to Cooled camera takes at least 2 connecting parts, more than the limit of 1.");
    const direct = solve({ optics: { ...corrector(), rear: male(T2), backFocusMm: 17.5 }, camera: camera(), parts: [], maxParts: 0 });
    expect(direct.status).toBe("ok");
    expect(direct.solutions[0].partCount).toBe(0);
    expect(direct.solutions[0].priceCents).toBe(0);
  });
});

describe("stock and the shortest chain", () => {
  it("does not use a part twice when only one is in stock, even across legs", () => {
    const ffCheap = part("ff-1", female(T2), female(T2), 1, { quantity: 1 });
    const ffLong = part("ff-3", female(T2), female(T2), 3);
    const station = part("oag", male(T2), male(T2), 10, { name: "Guider" });
    const req: SolveRequest = {
      optics: { ...corrector({ backFocusMm: undefined }), rear: male(T2) }, camera: { ...camera(), front: male(T2) },
      stations: [station], parts: [ffCheap, ffLong],
    };
    const res = solve(req);
    expect(res.shortest!.sensorDistanceMm).toBeCloseTo(1 + 10 + 3 + 17.5, 9);
    const unlimited = solve({ ...req, parts: [{ ...ffCheap, quantity: undefined }, ffLong] });
    expect(unlimited.shortest!.sensorDistanceMm).toBeCloseTo(1 + 10 + 1 + 17.5, 9);
    const none = solve({ ...req, parts: [ffCheap] });
    expect(none.status).toBe("no-connection");
    expect(none.reason).toBe("No connection fits the stock: the shortest one needs 2 × ff-1 but only 1 is in stock.");
  });

  it("keeps the shortest chain within maxParts even when a longer-in-parts chain is shorter in length", () => {
    const parts = [part("x1", female(M48), male("X"), 0.5), part("x2", female("X"), male(T2), 0.5), part("long", female(M48), male(T2), 4)];
    const res = solve({ optics: corrector({ backFocusMm: undefined }), camera: camera(), parts, maxParts: 1 });
    expect(ids(res.shortest!)).toEqual(["long", "camera"]);
    const two = solve({ optics: corrector({ backFocusMm: undefined }), camera: camera(), parts, maxParts: 2 });
    expect(ids(two.shortest!)).toEqual(["x1", "x2", "camera"]);
  });

  it("ignores parts with no stock", () => {
    const res = solve({ optics: corrector({ backFocusMm: undefined }), camera: camera(), parts: [{ ...adapter48, quantity: 0 }] });
    expect(res.status).toBe("no-connection");
  });
});

describe("without a back focus", () => {
  it("returns every connection, fewest parts first, then price (unknown last), then length — but no best route plus a spacer", () => {
    const parts = [adapter48, part("a48-cheap", female(M48), male(T2), 7, { priceCents: 500 }), part("a48-unpriced", female(M48), male(T2), 1),
      spacer("s1", T2, 1, { priceCents: 100 })];
    const res = solve({ optics: corrector({ backFocusMm: undefined }), camera: camera(), parts, maxSolutions: 4 });
    expect(res.status).toBe("ok");
    expect(res.targetMm).toBeNull();
    expect(res.toleranceMm).toBeNull();
    expect(res.solutions.map((s) => s.steps.filter((x) => x.role === "connector").map((x) => x.partId).join("+")))
      // v1 also listed "a48-cheap+s1"; contract v2 §4: a better route plus a spacer is not an alternative.
      .toEqual(["a48-cheap", "a48", "a48-unpriced"]);
    expect(res.solutions.every((s) => s.errorMm === null)).toBe(true);
    expect(res.solutions[2].priceCents).toBeNull();
  });
});

describe("stations", () => {
  it("keeps the stations in the order given", () => {
    const oag = part("oag", female(T2), male(T2), 10, { name: "Guider" });
    const tilt = part("tilt", female(T2), male(T2), 8, { name: "Tilt plate" });
    const res = solve({ optics: { ...corrector(), rear: male(T2), backFocusMm: 35.5 }, camera: camera(), stations: [tilt, oag], parts: [] });
    expect(ids(res.solutions[0])).toEqual(["tilt", "oag", "camera"]);
    expect(res.solutions[0].steps.map((s) => s.startMm)).toEqual([0, 8, 18]);
    expect(res.solutions[0].steps.map((s) => s.role)).toEqual(["station", "station", "camera"]);
  });
});

describe("warnings", () => {
  const base: SolveRequest = {
    optics: corrector({ rear: male(T2), backFocusMm: 55, focalRatio: 4, imageCircleMm: 40, maxLoadG: 900, weightG: 5000 }),
    camera: camera({ sensorDiagonalMm: 43.27, clearApertureMm: 46, weightG: 600 }),
    stations: [part("wheel2", female(T2), male(T2), 20, { clearApertureMm: 50, weightG: 400 })],
    parts: [spacer("s17", T2, 17.5, { clearApertureMm: 60 })],
  };

  it("flags vignetting with the required and actual apertures, the image circle and the load (optics' own weight excluded)", () => {
    const res = solve(base);
    const chain = res.solutions[0];
    expect(chain.sensorDistanceMm).toBe(55);
    const v = chain.warnings.filter((w) => w.code === "vignetting");
    // Wheel front at 17.5 mm from the optics: d = 37.5, needs 43.27 + 37.5 / 4 = 52.645 mm > 50.
    // Camera front at 37.5: d = 17.5, needs 43.27 + 4.375 = 47.645 mm > 46. Spacer: needs 57.02 < 60.
    expect(v.map((w) => w.partId)).toEqual(["wheel2", "camera"]);
    expect(v[0].message).toContain("50.0 mm");
    expect(v[0].message).toContain("52.6 mm");
    expect(chain.warnings.find((w) => w.code === "image-circle")?.message).toContain("43.3 mm");
    const load = chain.warnings.find((w) => w.code === "load");
    expect(load?.message).toContain("1000 g");
    expect(load?.message).toContain("900 g");
    expect(load?.message).toContain("at least"); // the spacer's weight is unknown
  });

  it("checks nothing it lacks the numbers for", () => {
    const res = solve({ ...base, optics: corrector({ rear: male(T2), backFocusMm: 55 }) });
    expect(res.solutions[0].warnings).toEqual([]);
  });
});

describe("the catalog graph is built once per parts array", () => {
  it("reuses the model for the same array and rebuilds for a new one", () => {
    const parts = [adapter48, coupler];
    const first = warmCatalog(parts);
    expect(warmCatalog(parts)).toBe(first);
    expect(warmCatalog([...parts])).not.toBe(first);
    const req: SolveRequest = { optics: corrector(), camera: camera(), stations: [wheel], parts };
    expect(solveTrain(req)).toEqual(solveTrain({ ...req, parts: [...parts] }));
  });
});
