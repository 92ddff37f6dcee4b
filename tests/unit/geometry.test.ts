// The same two lengths from four makers are one alternative with variants, not four.
import { describe, expect, it } from "vitest";
import { groupByGeometry } from "@/lib/planner/geometry";
import { solveTrain, type Part } from "@/lib/solver";

const M48 = "M48x0.75";
const spacer = (id: string, len: number, priceCents: number): Part => ({ id, front: { interface: M48, gender: "female" }, rear: { interface: M48, gender: "male" }, lengthMm: len, priceCents });
const parts = [
  spacer("a15", 15, 1000), spacer("b15", 15, 1100), spacer("c15", 15, 1200), spacer("d15", 15, 1300),
  spacer("a3", 3, 500), spacer("a10", 10, 900), spacer("a8", 8, 800),
];
const request = {
  optics: { id: "flat", front: null, rear: { interface: M48, gender: "male" as const }, lengthMm: 0, backFocusMm: 55.5 },
  camera: { id: "cam", front: { interface: M48, gender: "female" as const }, rear: null, lengthMm: 37.5 },
  parts, maxSolutions: 20,
};

describe("groupByGeometry", () => {
  it("folds other makers' copies of a chain into variants, best first, and keeps distinct geometries apart", () => {
    const pool = solveTrain(request).solutions;
    const shapes = new Map(parts.map((p) => [p.id, p]));
    const ids = (c: { steps: { role: string; partId: string }[] }) => c.steps.filter((s) => s.role === "connector").map((s) => s.partId).sort().join("+");
    expect(pool.slice(0, 2).map(ids)).toEqual(["a15+a3", "a3+b15"]); // v1: the same pair bought again
    const grouped = groupByGeometry(pool, (id) => shapes.get(id), 3);
    expect(ids(grouped[0])).toBe("a15+a3");
    expect(grouped[0].variants!.map(ids)).toEqual(["a3+b15", "a3+c15", "a3+d15"]);
    expect(new Set(grouped.map(ids)).size).toBe(grouped.length);
    expect(grouped.slice(1).every((c) => !ids(c).includes("15"))).toBe(true); // 10 + 8 = 18 mm, another geometry
  });
});
