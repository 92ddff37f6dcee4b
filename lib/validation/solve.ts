// The solve request (SOLVER.md v1), validated once here for the route, the planner and saved
// builds. `solveRequestSchema` is exactly SolveRequest; `solveApiRequestSchema` also takes
// catalog references ({ partId }) and a parts `source` for the route to resolve.
import { z } from "zod";
import { fieldErrorsOf } from "@/lib/errors";

// Sized to what a real plan needs (a shop's whole adapter range is a few hundred parts; a
// train rarely has more than ten pieces; the planner asks for 8 answers), so that one
// request's work stays small. The body cap is what 2,000 described parts take as JSON.
export const LIMITS = {
  parts: 2_000,
  stations: 8,
  filters: 8,
  maxParts: 12,
  maxSolutions: 20,
  requestBytes: 1_000_000,
  interfaceChars: 40,
  idChars: 200,
  nameChars: 200,
} as const;

const length = (what: string, max: number) =>
  z.number({ error: `${what} must be a number` }).min(0, `${what} cannot be negative`).max(max, `${what} is at most ${max} mm`);

export const solvePortSchema = z.object({
  interface: z.string().trim().min(1, "Name the interface").max(LIMITS.interfaceChars, `At most ${LIMITS.interfaceChars} characters`),
  gender: z.enum(["male", "female"], { error: "Gender is male or female" }),
});

export const solvePartSchema = z.object({
  id: z.string().min(1, "A part needs an id").max(LIMITS.idChars),
  name: z.string().max(LIMITS.nameChars).optional(),
  front: solvePortSchema.nullable(),
  rear: solvePortSchema.nullable(),
  lengthMm: length("Length", 3000),
  adjustMm: length("Adjustment", 500).optional(),
  reversible: z.boolean().optional(),
  quantity: z.number().int("Quantity is a whole number").min(0, "Quantity cannot be negative").max(1_000_000).optional(),
  priceCents: z.number().int("Price is in whole cents").min(0, "Price cannot be negative").max(100_000_000).optional(),
  clearApertureMm: length("Clear aperture", 500).optional(),
  weightG: z.number().min(0, "Weight cannot be negative").max(100_000).optional(),
});

export const solveOpticsSchema = solvePartSchema.extend({
  backFocusMm: length("Back focus", 500).optional(),
  backFocusToleranceMm: length("Back focus tolerance", 10).optional(),
  focalRatio: z.number().gt(0, "Focal ratio must be above 0").max(100).optional(),
  imageCircleMm: z.number().gt(0, "Image circle must be above 0").max(500).optional(),
  maxLoadG: z.number().min(0, "Load limit cannot be negative").max(1_000_000).optional(),
});

export const solveCameraSchema = solvePartSchema.extend({
  sensorDiagonalMm: z.number().gt(0, "Sensor diagonal must be above 0").max(200).optional(),
});

export const solveFilterSchema = z.object({
  thicknessMm: length("Filter thickness", 20),
  refractiveIndex: z.number().min(1, "Refractive index is at least 1").max(4).optional(),
});

const uniqueIds = (parts: { id: string }[], ctx: z.RefinementCtx) => {
  const seen = new Map<string, number>();
  parts.forEach((p, i) => {
    if (seen.has(p.id)) ctx.addIssue({ code: "custom", path: [i, "id"], message: `Part id "${p.id}" appears twice` });
    else seen.set(p.id, i);
  });
};

const partsList = z.array(solvePartSchema).max(LIMITS.parts, `At most ${LIMITS.parts} parts`).superRefine(uniqueIds);
const stationsList = <T extends z.ZodType>(item: T) => z.array(item).max(LIMITS.stations, `At most ${LIMITS.stations} stations`);
const common = {
  filters: z.array(solveFilterSchema).max(LIMITS.filters, `At most ${LIMITS.filters} filters`).optional(),
  maxParts: z.number().int("A whole number of parts").min(0, "Cannot be negative").max(LIMITS.maxParts, `At most ${LIMITS.maxParts} parts per chain`).optional(),
  maxSolutions: z.number().int("A whole number of solutions").min(1, "At least 1 solution").max(LIMITS.maxSolutions, `At most ${LIMITS.maxSolutions} solutions`).optional(),
};

/** Exactly SolveRequest (SOLVER.md), with bounds. */
export const solveRequestSchema = z.object({
  optics: solveOpticsSchema,
  camera: solveCameraSchema,
  stations: stationsList(solvePartSchema).optional(),
  parts: partsList,
  ...common,
});
export type SolveRequestInput = z.infer<typeof solveRequestSchema>;

/** A catalog part named by id or slug, for the route to resolve. */
export const partRefSchema = z.strictObject({
  partId: z.string().trim().min(1, "Choose a part").max(LIMITS.idChars),
});
export type PartRef = z.infer<typeof partRefSchema>;

export const partsSourceSchema = z.object({
  kind: z.enum(["catalog", "owned", "shop", "shops"], { error: "Source is catalog, owned, shop or shops" }),
  /** With kind "shop": the shop's slug (its address, /shops/<slug>). */
  shop: z.string().trim().min(1, "Choose a shop").max(140).optional(),
  /** With kind "shop": count what the signed-in user owns first ("what I own, then this shop"). */
  owned: z.boolean().optional(),
}).superRefine((s, ctx) => {
  if (s.kind === "shop" && !s.shop) ctx.addIssue({ code: "custom", path: ["shop"], message: "Choose a shop" });
});
export type PartsSource = z.infer<typeof partsSourceSchema>;

/** The body of POST /api/v1/solve: like SolveRequest, but items may be catalog references. */
export const solveApiRequestSchema = z.object({
  optics: z.union([partRefSchema, solveOpticsSchema]),
  camera: z.union([partRefSchema, solveCameraSchema]),
  stations: stationsList(z.union([partRefSchema, solvePartSchema])).optional(),
  parts: partsList.optional(),
  source: partsSourceSchema.optional(),
  ...common,
}).superRefine((r, ctx) => {
  if (r.parts === undefined && r.source === undefined) {
    ctx.addIssue({ code: "custom", path: ["parts"], message: "Send either parts or a source of parts" });
  } else if (r.parts !== undefined && r.source !== undefined) {
    ctx.addIssue({ code: "custom", path: ["source"], message: "Send either parts or a source, not both" });
  }
});
export type SolveApiRequest = z.infer<typeof solveApiRequestSchema>;

/** zod issues keyed by dotted path ("parts.3.front.interface"); root issues under "_root". */
export function zodFieldErrors(error: { issues: readonly unknown[] }): Record<string, string[]> {
  return fieldErrorsOf(error.issues as Parameters<typeof fieldErrorsOf>[0]);
}
