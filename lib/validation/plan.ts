import { z } from "zod";

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
