import { z } from "zod";
import { isKnownInterface } from "@/lib/interfaces";

export const PART_KINDS = [
  "optics", "camera", "adapter", "spacer", "extension", "filter-wheel", "filter-drawer",
  "oag", "tilt-plate", "diagonal", "other",
] as const;
export type PartKind = (typeof PART_KINDS)[number];

export const OPTICS_ROLES = ["telescope", "corrector", "astrograph"] as const;
export const FILTER_SIZES = ["1.25in", "31mm", "36mm", "2in", "50mm-sq"] as const;

export const portSchema = z.object({
  interface: z.string().refine(isKnownInterface, { message: "Unknown interface code" }),
  gender: z.enum(["male", "female"]),
});
export type PortInput = z.infer<typeof portSchema>;

const mm = (max: number) => z.number().finite().min(0).max(max);

/** Kind-specific numbers. Every field is optional here; `partInputSchema` requires per kind. */
export const partSpecsSchema = z.object({
  // optics
  opticsRole: z.enum(OPTICS_ROLES).optional(),
  focalLengthMm: mm(20000).optional(),
  apertureMm: mm(2000).optional(),
  backFocusMm: mm(500).optional(),
  backFocusToleranceMm: z.number().finite().min(0.01).max(10).optional(),
  reduction: z.number().finite().min(0.2).max(3).optional(),
  imageCircleMm: mm(200).optional(),
  maxLoadG: mm(100000).optional(),
  // camera
  flangeDepthMm: mm(100).optional(),
  sensorWidthMm: mm(100).optional(),
  sensorHeightMm: mm(100).optional(),
  pixelSizeUm: z.number().finite().min(0.5).max(50).optional(),
  windowThicknessMm: mm(10).optional(),
  // filter holders
  slots: z.number().int().min(1).max(12).optional(),
  filterSize: z.enum(FILTER_SIZES).optional(),
  filterThicknessMm: mm(10).optional(),
}).strict();
export type PartSpecs = z.infer<typeof partSpecsSchema>;

export const partInputSchema = z.object({
  kind: z.enum(PART_KINDS),
  maker: z.string().trim().min(1, "Maker is required").max(80),
  model: z.string().trim().min(1, "Model is required").max(120),
  slug: z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "Lowercase words joined by hyphens").max(140).optional(),
  description: z.string().max(2000).optional(),
  front: portSchema.nullable(),
  rear: portSchema.nullable(),
  lengthMm: mm(3000),
  adjustMm: mm(500).optional(),
  reversible: z.boolean().default(false),
  clearApertureMm: mm(500).optional(),
  weightG: mm(100000).optional(),
  /** The maker's list price, in cents (shops set their own prices in their inventory). */
  listPriceCents: z.number().int().min(0).max(100_000_000).optional(),
  specs: partSpecsSchema.default({}),
}).superRefine((p, ctx) => {
  const need = (field: keyof PartSpecs, why: string) => {
    if (p.specs[field] === undefined) ctx.addIssue({ code: "custom", path: ["specs", field], message: why });
  };
  if (!p.front && !p.rear) ctx.addIssue({ code: "custom", path: ["rear"], message: "A part needs at least one face" });
  if (p.kind === "optics") {
    need("opticsRole", "Say whether this is a telescope, a corrector or an astrograph");
    if (!p.rear) ctx.addIssue({ code: "custom", path: ["rear"], message: "Optics need a rear (sensor-side) face" });
    if (p.specs.opticsRole !== "corrector") {
      need("focalLengthMm", "Focal length is required for a telescope");
      need("apertureMm", "Aperture is required for a telescope");
    }
    if (p.specs.opticsRole !== "telescope") need("backFocusMm", "A corrector needs its back focus");
  }
  if (p.kind === "camera") {
    if (!p.front) ctx.addIssue({ code: "custom", path: ["front"], message: "A camera needs a front face" });
    need("sensorWidthMm", "Sensor width is required");
    need("sensorHeightMm", "Sensor height is required");
    need("pixelSizeUm", "Pixel size is required");
  }
  if (p.kind === "filter-wheel" || p.kind === "filter-drawer") need("filterSize", "Filter size is required");
  if (p.kind !== "optics" && p.kind !== "camera" && (!p.front || !p.rear)) {
    ctx.addIssue({ code: "custom", path: [p.front ? "rear" : "front"], message: "A connecting part needs both faces" });
  }
});
export type PartInput = z.input<typeof partInputSchema>;
export type PartParsed = z.output<typeof partInputSchema>;

export function sensorDiagonalMm(specs: PartSpecs): number | undefined {
  if (specs.sensorWidthMm === undefined || specs.sensorHeightMm === undefined) return undefined;
  return Math.hypot(specs.sensorWidthMm, specs.sensorHeightMm);
}

export function slugify(...words: string[]): string {
  return words.join(" ").toLowerCase().normalize("NFKD").replace(/[^a-z0-9]+/g, "-").replace(/^-+|-+$/g, "").slice(0, 140);
}

/** The submission form sends empty faces as { interface: "" }: turn those into null first. */
export const partFormSchema = z.preprocess((raw) => {
  if (typeof raw !== "object" || raw === null) return raw;
  const v = { ...(raw as Record<string, unknown>) };
  for (const side of ["front", "rear"] as const) {
    const port = v[side] as { interface?: string } | null | undefined;
    if (!port?.interface) v[side] = null;
  }
  if (v.specs && typeof v.specs === "object") {
    v.specs = Object.fromEntries(Object.entries(v.specs as Record<string, unknown>).filter(([, x]) => x !== undefined && x !== "" && !(typeof x === "number" && Number.isNaN(x))));
  }
  for (const k of ["adjustMm", "clearApertureMm", "weightG", "listPriceCents", "description"]) {
    if (v[k] === "" || (typeof v[k] === "number" && Number.isNaN(v[k]))) delete v[k];
  }
  return v;
}, partInputSchema);
