// POST /api/v1/solve — solve a train (inline parts, or catalog references resolved here)
import { withSession } from "@/lib/auth/session";
import { readJsonBody } from "@/lib/http/body";
import { AppError, fieldErrorsOf } from "@/lib/errors";
import { planJson } from "@/lib/planner/plan-cache";
import { isPartRef } from "@/lib/planner/part-ref";
import type { PlanInput } from "@/lib/planner/run-plan";
import { planAcrossShops } from "@/lib/shops/across-shops";
import { solveInWorker } from "@/lib/solve-pool/pool";
import type { Camera, Optics, Part } from "@/lib/solver";
import { parsePlanRequest } from "@/lib/validation/plan";
import { LIMITS } from "@/lib/validation/solve";

export const dynamic = "force-dynamic";

export const POST = withSession(async (request, { user }) => {
  const parsed = parsePlanRequest(await readJsonBody(request, LIMITS.requestBytes));
  if (!parsed.success) {
    const tooLarge = parsed.issues.some((i) => i.code === "too_big" && (i.path[0] === "parts" || i.path[0] === "stations") && i.path.length === 1);
    throw new AppError(tooLarge ? "payload_too_large" : "bad_request:validation", tooLarge ? "Too many parts or stations in one request." : "Some fields need attention.", fieldErrorsOf(parsed.issues));
  }
  const input = parsed.data as PlanInput;
  // An all-inline request carries its own (possibly huge) parts list: solve it on a worker
  // thread under a time budget. Catalog plans use the catalog graph cached in this process.
  if (input.parts && !input.corrector && ![input.optics, input.camera, ...(input.stations ?? [])].some(isPartRef)) {
    const optics = input.backFocusToleranceMm !== undefined ? { ...(input.optics as Optics), backFocusToleranceMm: input.backFocusToleranceMm } : input.optics as Optics;
    return Response.json(await solveInWorker({
      optics, camera: input.camera as Camera, stations: input.stations as Part[] | undefined, parts: input.parts,
      filters: input.filters, maxParts: input.maxParts, maxSolutions: input.maxSolutions,
    }));
  }
  if (input.source?.kind === "shops") return Response.json(await planAcrossShops({ input, viewer: user }));
  return new Response(await planJson({ input, viewer: user }), { headers: { "content-type": "application/json" } });
}, { anonymous: true, limit: "solve" });
