// The planner draws the chain that reaches the nearest distance, not the bare shortest one.
import { describe, expect, it } from "vitest";
import { nearestChain } from "@/lib/planner/nearest-chain";
import { solveTrain, type Part, type SolveRequest } from "@/lib/solver";

const M48 = "M48x0.75";
const spacer = (id: string, len: number): Part => ({ id, front: { interface: M48, gender: "female" }, rear: { interface: M48, gender: "male" }, lengthMm: len, quantity: 1 });
const request: SolveRequest = {
  optics: { id: "flat", front: null, rear: { interface: M48, gender: "male" }, lengthMm: 0, backFocusMm: 55, backFocusToleranceMm: 0.05 },
  camera: { id: "cam", front: { interface: M48, gender: "female" }, rear: null, lengthMm: 37.5 },
  parts: [spacer("s15", 15), spacer("s2.4", 2.4)],
};

describe("nearestChain", () => {
  it("is the chain reaching the nearer side of the window, with its error against the real target", () => {
    const result = solveTrain(request);
    expect(result.status).toBe("out-of-reach");
    expect(result.shortest!.sensorDistanceMm).toBeCloseTo(37.5, 9); // the bare camera: what the diagram drew before
    expect(result.nearest!.belowMm).toBeCloseTo(54.9, 9);
    const chain = nearestChain(request, result)!;
    expect(chain.sensorDistanceMm).toBeCloseTo(54.9, 9);
    expect(chain.errorMm).toBeCloseTo(-0.1, 9);
    expect(chain.steps.filter((s) => s.role === "connector").map((s) => s.partId).sort()).toEqual(["s15", "s2.4"]);
  });

  it("is null when something lands in the window", () => {
    const ok = { ...request, optics: { ...request.optics, backFocusToleranceMm: 0.5 } };
    expect(nearestChain(ok, solveTrain(ok))).toBeNull();
  });
});
