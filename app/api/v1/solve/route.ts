// POST /api/v1/solve — solve a train (inline parts, or catalog references resolved here)
import { withSession } from "@/lib/auth/session";
import { AppError, fieldErrorsOf } from "@/lib/errors";
import { runPlan, type PlanInput } from "@/lib/planner/run-plan";
import { planExtrasSchema, splitPlanExtras } from "@/lib/validation/plan";
import { solveApiRequestSchema } from "@/lib/validation/solve";

export const dynamic = "force-dynamic";
const MAX_BYTES = 6_000_000;

export const POST = withSession(async (request, { user }) => {
  const text = await request.text();
  if (text.length > MAX_BYTES) throw new AppError("payload_too_large", "The request is larger than 6 MB: send at most 20,000 parts.");
  let raw: unknown;
  try { raw = JSON.parse(text); } catch { throw new AppError("bad_request:json", "The request body is not valid JSON."); }
  const { extras, rest } = splitPlanExtras(raw);
  const parsedExtras = planExtrasSchema.safeParse(extras);
  const parsed = solveApiRequestSchema.safeParse(rest);
  if (!parsed.success || !parsedExtras.success) {
    const issues = [...(parsed.success ? [] : parsed.error.issues), ...(parsedExtras.success ? [] : parsedExtras.error.issues)];
    const tooLarge = issues.some((i) => i.code === "too_big" && (i.path[0] === "parts" || i.path[0] === "stations") && i.path.length === 1);
    throw new AppError(tooLarge ? "payload_too_large" : "bad_request:validation", tooLarge ? "Too many parts or stations in one request." : "Some fields need attention.", fieldErrorsOf(issues));
  }
  const input = { ...parsed.data, ...parsedExtras.data } as PlanInput;
  return Response.json(await runPlan({ input, viewer: user }));
}, { anonymous: true });
