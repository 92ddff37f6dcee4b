// Contract v2 (SOLVER.md "Contract v2"), one hand-made trade case per rule. Invented parts;
// real interface codes; clearances by the product's rule (sensor diagonal + distance / f-ratio).
import { describe, expect, it } from "vitest";
import { contractVersion, solveTrain, type Chain, type SolveRequest } from "@/lib/solver";
import { camera, chainProblems, corrector, female, M48, male, part, spacer, T2 } from "./support/brute-force";

const M63 = "M63x1";
const connectors = (c: Chain) => c.steps.filter((s) => s.role === "connector").map((s) => s.partId).sort().join("+");

function solve(req: SolveRequest) {
  const res = solveTrain(req);
  for (const c of [...res.solutions, ...res.solutions.flatMap((s) => s.variants ?? [])]) {
    expect(chainProblems(req, c, res.targetMm, "target")).toEqual([]);
  }
  return res;
}

describe("solver contract v2", () => {
  it("says which contract it implements", () => {
    expect(contractVersion).toBe(2);
  });

  it("ranks a step-up/step-down pair after a plain spacer of the same parts count", () => {
    // M48 flattener, 55 mm; camera with an M48 front at 17.5 mm: 37.5 mm to make up with two parts.
    const req: SolveRequest = {
      optics: corrector({ backFocusMm: 55 }),
      camera: camera({ front: female(M48) }),
      parts: [
        part("up", female(M48), male(M63), 18.75, { priceCents: 500 }), // M48 → M63 step-up
        part("down", female(M63), male(M48), 18.75, { priceCents: 500 }), // and back down: exact, cheap
        spacer("s30", M48, 30, { priceCents: 1500 }),
        spacer("s7", M48, 7.5, { priceCents: 1500 }),
      ],
      maxSolutions: 2,
    };
    const res = solve(req);
    expect(res.solutions.map(connectors)).toEqual(["s30+s7", "down+up"]);
    expect(res.solutions.map((c) => c.detours)).toEqual([0, 1]); // M48 → M63 → M48 is one detour
  });

  it("ranks a narrow thread in a full-frame beam after a wide one, even with more parts", () => {
    // f/4, 43.3 mm diagonal, D = 55 mm. A part at the flattener's rear, 55 mm ahead of the
    // sensor, needs 43.3 + 55 / 4 = 57.05 mm: a narrow one clearing 38 mm vignettes, wide M48
    // spacers clearing 60 mm do not (the camera's 60 mm needs only 43.3 + 17.5 / 4 = 47.7).
    const full = { sensorDiagonalMm: 43.3, clearApertureMm: 60 };
    const req: SolveRequest = {
      optics: corrector({ backFocusMm: 55, focalRatio: 4 }),
      camera: camera({ front: female(M48), ...full }),
      parts: [
        part("t2-narrow", female(M48), male(M48), 37.5, { clearApertureMm: 38, priceCents: 900 }),
        spacer("w25", M48, 25, { clearApertureMm: 60, priceCents: 2000 }),
        spacer("w12", M48, 12.5, { clearApertureMm: 60, priceCents: 2000 }),
      ],
      maxSolutions: 3,
    };
    const res = solve(req);
    // v1 put the one-part narrow chain first; v2 puts it after every clean chain.
    expect(res.solutions.map(connectors)).toEqual(["w12+w25", "w12+w12+w12", "t2-narrow"]);
    expect(res.solutions[0].warnings).toEqual([]);
    expect(res.solutions[2].warnings.map((w) => w.code)).toEqual(["vignetting"]);
  });

  it("lists four makers of the same 3 + 15 mm pair as one solution with 3 variants", () => {
    const makers = ["a", "b", "c", "d"];
    const req: SolveRequest = {
      optics: corrector({ backFocusMm: 55.5 }),
      camera: camera({ front: female(M48), lengthMm: 37.5 }),
      parts: [
        ...makers.map((m, i) => spacer(`${m}15`, M48, 15, { priceCents: 1000 + 100 * i, quantity: 1 })),
        spacer("a3", M48, 3, { priceCents: 500, quantity: 1 }),
        spacer("a10", M48, 10, { priceCents: 900, quantity: 1 }), spacer("a8", M48, 8, { priceCents: 800, quantity: 1 }),
      ],
      maxSolutions: 3,
    };
    const res = solve(req);
    expect(connectors(res.solutions[0])).toBe("a15+a3");
    expect(res.solutions[0].variants!.map(connectors)).toEqual(["a3+b15", "a3+c15", "a3+d15"]);
    // The other solutions are other geometries (10 + 8 mm), never the 15 mm pair bought again.
    expect(res.solutions.slice(1).map(connectors)).toEqual(["a10+a8"]);
    expect(res.solutions.flatMap((s) => s.variants!).every((v) => v.variants === undefined)).toBe(true);
  });

  it("without a back focus, the best route plus a spacer is not an alternative", () => {
    const req: SolveRequest = {
      optics: corrector({ backFocusMm: undefined }),
      camera: camera(),
      parts: [
        part("a48", female(M48), male(T2), 5, { priceCents: 2000 }),
        part("m48-m42", female(M48), male("M42x1"), 4, { priceCents: 1000 }),
        part("m42-t2", female("M42x1"), male(T2), 4, { priceCents: 1000 }),
        spacer("s1", T2, 1, { priceCents: 100 }), spacer("s2", M48, 2, { priceCents: 100 }),
      ],
      maxSolutions: 10,
    };
    const res = solve(req);
    // Every other chain is one of these two plus spacers.
    expect(res.solutions.map(connectors)).toEqual(["a48", "m42-t2+m48-m42"]);
  });

  it("lets two adjustable parts take up the distance in order, sky side first", () => {
    // 27 mm: 2 + 2 + 17.5 = 21.5 at their shortest; 5.5 mm to take up, 3 mm each at most.
    const a = part("adj-a", female(T2), male(T2), 2, { adjustMm: 3 });
    const b = part("adj-b", female(T2), male(T2), 2, { adjustMm: 3 });
    const res = solve({ optics: { ...corrector(), rear: male(T2), backFocusMm: 27 }, camera: camera(), parts: [a, b] });
    const chain = res.solutions[0];
    expect(chain.steps.map((s) => s.lengthMm)).toEqual([5, 4.5, 17.5]); // the first takes all 3, the next 2.5
    expect(chain.errorMm).toBe(0);
  });

  it("moves a narrow spacer nearer the sensor when that clears the beam (the multiset's best ordering)", () => {
    // f/2, 20 mm diagonal, D = 5.5 + 5.5 + 5 + 2 + 2.5 = 20.5 mm. The narrow 30 mm spacer needs
    // 20 + 20.5 / 2 = 30.25 mm right behind the flattener (vignetting), 20 + 15 / 2 = 27.5 behind a wide one.
    const req: SolveRequest = {
      optics: corrector({ backFocusMm: 20.5, focalRatio: 2 }),
      camera: camera({ lengthMm: 2.5, sensorDiagonalMm: 20 }),
      parts: [
        spacer("n", M48, 5, { clearApertureMm: 30, quantity: 1 }),
        spacer("w", M48, 5.5, { quantity: 2 }),
        part("a", female(M48), male(T2), 2, { quantity: 1 }),
      ],
      maxParts: 4,
    };
    const res = solve(req);
    expect(res.solutions.map(connectors)).toEqual(["a+n+w+w"]);
    const chain = res.solutions[0];
    expect(chain.warnings).toEqual([]);
    expect(chain.steps.find((s) => s.partId === "n")!.startMm).toBeGreaterThan(0);
  });
});
