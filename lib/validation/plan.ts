import { z } from "zod";
import { solveApiRequestSchema, type SolveApiRequest } from "./solve";

/** Planner extras that ride along with the solve request (SOLVER.md) on POST /api/v1/solve. */
export const planExtrasSchema = z.object({
  corrector: z.object({ partId: z.string().trim().min(1).max(160) }).optional(),
  backFocusToleranceMm: z.number().finite().min(0.01, "At least 0.01 mm").max(10, "At most 10 mm").optional(),
});
export type PlanExtras = z.infer<typeof planExtrasSchema>;

/** Split the planner's extras off a raw body so the solve schema sees only its own fields. */
export function splitPlanExtras(raw: unknown): { extras: unknown; rest: unknown } {
  if (typeof raw !== "object" || raw === null || Array.isArray(raw)) return { extras: {}, rest: raw };
  const { corrector, backFocusToleranceMm, ...rest } = raw as Record<string, unknown>;
  return { extras: { corrector, backFocusToleranceMm }, rest };
}

export type PlanRequest = SolveApiRequest & PlanExtras;

/** The body of POST /api/v1/solve (and a saved build's request): the solve schema plus the planner's extras. */
export function parsePlanRequest(raw: unknown):
  { success: true; data: PlanRequest } | { success: false; issues: z.core.$ZodIssue[] } {
  const { extras, rest } = splitPlanExtras(raw);
  const parsedExtras = planExtrasSchema.safeParse(extras);
  const parsed = solveApiRequestSchema.safeParse(rest);
  if (parsed.success && parsedExtras.success) return { success: true, data: { ...parsed.data, ...parsedExtras.data } };
  return { success: false, issues: [...(parsed.error?.issues ?? []), ...(parsedExtras.error?.issues ?? [])] };
}
