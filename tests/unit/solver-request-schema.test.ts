// The shared zod schema for solve requests (lib/validation/solve.ts).
import { describe, expect, it } from "vitest";
import { solveApiRequestSchema, solveRequestSchema, zodFieldErrors } from "@/lib/validation/solve";

const spacer = (id: string) => ({ id, front: { interface: "M42x0.75", gender: "female" }, rear: { interface: "M42x0.75", gender: "male" }, lengthMm: 5 });
const optics = { id: "o", front: null, rear: { interface: "M48x0.75", gender: "male" }, lengthMm: 0, backFocusMm: 55 };
const camera = { id: "c", front: { interface: "M42x0.75", gender: "female" }, rear: null, lengthMm: 17.5, sensorDiagonalMm: 28 };

const errors = (schema: { safeParse: (v: unknown) => { success: boolean; error?: { issues: unknown[] } } }, v: unknown) => {
  const r = schema.safeParse(v);
  return r.success ? {} : zodFieldErrors(r.error!);
};

describe("solveRequestSchema", () => {
  it("accepts a SolveRequest exactly as SOLVER.md writes it", () => {
    const req = { optics, camera, stations: [spacer("w")], filters: [{ thicknessMm: 2, refractiveIndex: 1.5168 }], parts: [spacer("a")], maxParts: 12, maxSolutions: 20 };
    expect(solveRequestSchema.parse(req)).toEqual(req);
  });

  it("reports bad fields by dotted path", () => {
    expect(errors(solveRequestSchema, {
      optics: { ...optics, backFocusMm: -1 }, camera: { ...camera, front: { interface: "", gender: "left" } },
      parts: [spacer("a"), { ...spacer("a"), lengthMm: Number.NaN }, { ...spacer("b"), front: { interface: "x".repeat(41), gender: "male" } }],
      maxParts: 13, maxSolutions: 0, filters: Array(9).fill({ thicknessMm: 1 }),
    })).toEqual({
      "optics.backFocusMm": ["Back focus cannot be negative"],
      "camera.front.interface": ["Name the interface"],
      "camera.front.gender": ["Gender is male or female"],
      "parts.1.lengthMm": ["Length must be a number"],
      "parts.2.front.interface": ["At most 40 characters"],
      maxParts: ["At most 12 parts per chain"],
      maxSolutions: ["At least 1 solution"],
      filters: ["At most 8 filters"],
    });
  });

  it("wants part ids to be unique (the solver reports multisets of ids)", () => {
    expect(errors(solveRequestSchema, { optics, camera, parts: [spacer("a"), spacer("b"), spacer("a")] }))
      .toEqual({ "parts.2.id": ['Part id "a" appears twice'] });
  });

  it("bounds the number of parts and stations", () => {
    // Issue 16: a real plan needs a few hundred parts, not 20,000 (one such request stalled the server).
    const many = Array.from({ length: 2_001 }, (_, i) => spacer(`p${i}`));
    expect(errors(solveRequestSchema, { optics, camera, parts: many })).toEqual({ parts: ["At most 2000 parts"] });
    expect(errors(solveRequestSchema, { optics, camera, parts: many.slice(0, 2_000) })).toEqual({});
    expect(errors(solveRequestSchema, { optics, camera, parts: [], maxSolutions: 21 })).toEqual({ maxSolutions: ["At most 20 solutions"] });
    expect(errors(solveRequestSchema, { optics, camera, parts: [], stations: Array.from({ length: 9 }, (_, i) => spacer(`s${i}`)) }))
      .toEqual({ stations: ["At most 8 stations"] });
  });
});

describe("solveApiRequestSchema", () => {
  it("takes catalog references for optics, camera and stations, and a source instead of parts", () => {
    const req = { optics: { partId: "flattener-x" }, camera: { partId: "cam" }, stations: [{ partId: "wheel" }, spacer("inline")], source: { kind: "shop", shop: "s1" } };
    expect(solveApiRequestSchema.parse(req)).toEqual(req);
    expect(solveApiRequestSchema.parse({ optics, camera, parts: [spacer("a")] })).toMatchObject({ optics, camera });
  });

  it("wants exactly one of parts and source, and a shop id for a shop", () => {
    const refs = { optics: { partId: "o" }, camera: { partId: "c" } };
    expect(errors(solveApiRequestSchema, refs)).toEqual({ parts: ["Send either parts or a source of parts"] });
    expect(errors(solveApiRequestSchema, { ...refs, parts: [], source: { kind: "catalog" } })).toEqual({ source: ["Send either parts or a source, not both"] });
    expect(errors(solveApiRequestSchema, { ...refs, source: { kind: "shop" } })).toEqual({ "source.shop": ["Choose a shop"] });
    expect(errors(solveApiRequestSchema, { ...refs, source: { kind: "friends" } })).toEqual({ "source.kind": ["Source is catalog, owned, shop or shops"] });
  });

  it("reports the closest alternative of a reference-or-part field, not just 'invalid'", () => {
    expect(errors(solveApiRequestSchema, { optics: { partId: "" }, camera, parts: [] })).toEqual({ "optics.partId": ["Choose a part"] });
    expect(errors(solveApiRequestSchema, { optics: { ...optics, lengthMm: -3 }, camera, parts: [] })).toEqual({ "optics.lengthMm": ["Length cannot be negative"] });
    expect(errors(solveApiRequestSchema, 7)).toEqual({ _root: ["Invalid input: expected object, received number"] });
  });
});
