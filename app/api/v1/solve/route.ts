// POST /api/v1/solve — solve a train (inline parts, or catalog references resolved here)
import { readJsonBody, withSession } from "@/lib/auth/session";
import { AppError, fieldErrorsOf } from "@/lib/errors";
import { planJson } from "@/lib/planner/plan-cache";
import type { PlanInput } from "@/lib/planner/run-plan";
import { planAcrossShops } from "@/lib/shops/across-shops";
import { parsePlanRequest } from "@/lib/validation/plan";

export const dynamic = "force-dynamic";
const MAX_BYTES = 6_000_000;

export const POST = withSession(async (request, { user }) => {
  const parsed = parsePlanRequest(await readJsonBody(request, MAX_BYTES));
  if (!parsed.success) {
    const tooLarge = parsed.issues.some((i) => i.code === "too_big" && (i.path[0] === "parts" || i.path[0] === "stations") && i.path.length === 1);
    throw new AppError(tooLarge ? "payload_too_large" : "bad_request:validation", tooLarge ? "Too many parts or stations in one request." : "Some fields need attention.", fieldErrorsOf(parsed.issues));
  }
  const input = parsed.data as PlanInput;
  if (input.source?.kind === "shops") return Response.json(await planAcrossShops({ input, viewer: user }));
  return new Response(await planJson({ input, viewer: user }), { headers: { "content-type": "application/json" } });
}, { anonymous: true });
