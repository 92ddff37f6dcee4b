import { z } from "zod";
import { partSpecsSchema, portSchema } from "./parts";

export const reviewDecisionSchema = z.object({
  decision: z.enum(["approve", "reject"], { message: "Approve or reject" }),
  reason: z.string().trim().max(1000).optional(),
}).refine((v) => v.decision === "approve" || (v.reason && v.reason.length >= 3), { path: ["reason"], message: "Say why it is rejected (the submitter reads this)" });
export type ReviewDecision = z.infer<typeof reviewDecisionSchema>;

/** Moderator corrections to an approved part. */
export const partPatchSchema = z.object({
  maker: z.string().trim().min(1).max(80).optional(),
  model: z.string().trim().min(1).max(120).optional(),
  description: z.string().max(2000).nullable().optional(),
  front: portSchema.nullable().optional(),
  rear: portSchema.nullable().optional(),
  lengthMm: z.number().finite().min(0).max(3000).optional(),
  adjustMm: z.number().finite().min(0).max(500).nullable().optional(),
  reversible: z.boolean().optional(),
  clearApertureMm: z.number().finite().min(0).max(500).nullable().optional(),
  weightG: z.number().finite().min(0).max(100000).nullable().optional(),
  listPriceCents: z.number().int().min(0).max(100_000_000).nullable().optional(),
  specs: partSpecsSchema.partial().optional(),
}).strict().refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change" });
export type PartPatch = z.infer<typeof partPatchSchema>;

/** GET /api/v1/submissions?limit=&cursor= — one page of the queue (or of your own submissions). */
export const listSubmissionsQuerySchema = z.object({
  limit: z.coerce.number({ message: "A whole number from 1 to 100" }).int("A whole number from 1 to 100")
    .min(1, "A whole number from 1 to 100").max(100, "A whole number from 1 to 100").default(50),
  cursor: z.string().max(300).regex(/^[A-Za-z0-9_-]*$/, "Not a cursor from this API").optional(),
});
export type ListSubmissionsQuery = z.infer<typeof listSubmissionsQuerySchema>;
