// "What to change": the smallest set of changes (one, else two) that lands in the window,
// never an item the catalog does not hold.
import { describe, expect, it } from "vitest";
import { whatToChange } from "@/lib/planner/what-to-change";
import { solveTrain, type Camera, type Part, type SolveRequest } from "@/lib/solver";

const M48 = "M48x0.75";
const male = (i: string) => ({ interface: i, gender: "male" as const });
const female = (i: string) => ({ interface: i, gender: "female" as const });
const spacer = (len: number): Part => ({ id: `s${len}`, front: female(M48), rear: male(M48), lengthMm: len });
// A body on the F bayonet (46.5 mm flange, from memory of the published value) behind a T-ring.
const body: Camera = { id: "body-f", front: female("bayonet-f"), rear: null, lengthMm: 46.5, sensorDiagonalMm: 28 };
const request: SolveRequest = {
  optics: { id: "astro", front: null, rear: male(M48), lengthMm: 0, backFocusMm: 55 },
  stations: [
    { id: "oag", front: female(M48), rear: male(M48), lengthMm: 10.5 },
    { id: "wheel", front: female(M48), rear: male(M48), lengthMm: 20 },
  ],
  camera: body,
  parts: [{ id: "t-ring-f", front: female(M48), rear: male("bayonet-f"), lengthMm: 8 }, spacer(0.5), spacer(1), spacer(2)],
};

describe("whatToChange", () => {
  it("finds that removing both devices works when neither alone does", () => {
    expect(solveTrain(request).status).toBe("too-long"); // 10.5 + 20 + 8 + 46.5 = 85
    const remedies = whatToChange({ request, cameras: [], correctors: [] });
    expect(remedies).toHaveLength(1);
    expect(remedies[0].changes).toEqual([
      { kind: "remove-station", index: 0, id: "oag" },
      { kind: "remove-station", index: 1, id: "wheel" },
    ]);
    expect(Math.abs(remedies[0].sensorDistanceMm - 55)).toBeLessThanOrEqual(0.5); // 8 + 46.5 (+ a spacer)
  });

  it("offers a single catalog camera before pairs, and only cameras it was given", () => {
    const cooled: Camera = { id: "cooled-m48", front: female(M48), rear: null, lengthMm: 17.5, sensorDiagonalMm: 28 };
    const remedies = whatToChange({ request, cameras: [body, cooled], correctors: [] });
    expect(remedies[0].changes).toEqual([{ kind: "replace-camera", id: "cooled-m48" }]);
    const ids = remedies.flatMap((r) => r.changes.map((c) => c.id));
    for (const id of ids) expect(["oag", "wheel", "cooled-m48"]).toContain(id);
    // The pair of removals keeps the camera you chose, so it is offered too.
    expect(remedies.some((r) => r.changes.length === 2 && r.changes.every((c) => c.kind === "remove-station"))).toBe(true);
  });

  it("says nothing can be changed rather than invent a part", () => {
    const stuck = { ...request, parts: [] };
    expect(whatToChange({ request: stuck, cameras: [], correctors: [] })).toEqual([]);
  });
});
