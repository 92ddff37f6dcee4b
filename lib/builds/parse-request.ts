// A saved build's `request` is the body of POST /api/v1/solve: validate it with the same schemas.
import { AppError, fieldErrorsOf } from "@/lib/errors";
import { isPartRef as isRef } from "@/lib/planner/part-ref";
import type { PlanInput } from "@/lib/planner/run-plan";
import { parsePlanRequest } from "@/lib/validation/plan";


/**
 * Parse a solve request for saving as a build. Field errors are prefixed with `prefix`
 * (e.g. "request.optics.partId"). Every part must come from the server: optics, camera and
 * stations as catalog references, connectors from a source (the catalog or the owner's
 * gear). An inline part could carry a catalog part's id with invented numbers and be shown
 * under that part's name (issue 16), so inline parts are refused.
 */
export function parseBuildPlanRequest(raw: unknown, prefix = "request"): PlanInput {
  // A plan that names neither parts nor a source means the whole catalog (the planner's default).
  const body = typeof raw === "object" && raw !== null && !("parts" in raw) && !("source" in raw) ? { ...raw, source: { kind: "catalog" } } : raw;
  const parsed = parsePlanRequest(body);
  if (!parsed.success) throw new AppError("bad_request:validation", "The plan to save needs attention.", fieldErrorsOf(parsed.issues, [prefix]));
  const input = parsed.data as PlanInput;
  const fields: Record<string, string[]> = {};
  if (!isRef(input.optics)) fields[`${prefix}.optics`] = ["Choose the optics from the catalog ({ partId })"];
  if (!isRef(input.camera)) fields[`${prefix}.camera`] = ["Choose the camera from the catalog ({ partId })"];
  (input.stations ?? []).forEach((s, i) => { if (!isRef(s)) fields[`${prefix}.stations.${i}`] = ["Choose each device from the catalog ({ partId })"]; });
  if (input.parts !== undefined) fields[`${prefix}.parts`] = ["A build draws its parts from the catalog or your gear: send a source instead of a parts list"];
  if (Object.keys(fields).length) throw new AppError("bad_request:validation", "A build is made of catalog parts.", fields);
  return input;
}
