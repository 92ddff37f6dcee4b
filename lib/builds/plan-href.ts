// "Open in planner": the saved plan as the planner's URL (lib/planner/url-state.ts).
import type { PlanResponse } from "@/lib/planner/api-types";
import type { PlanInput } from "@/lib/planner/run-plan";
import { EMPTY_PLAN, planStateToParams, type PlanState } from "@/lib/planner/url-state";
import { itemOf } from "./chain";

export function planHrefOf(request: PlanInput, result: PlanResponse, solutionIndex: number): string {
  const ctx = result.context;
  const slug = (id: string) => itemOf(result, id).slug;
  const glass = (request.filters ?? []).map((f) => ({ thicknessMm: f.thicknessMm, refractiveIndex: f.refractiveIndex ?? 1.5 }));
  const state: PlanState = {
    ...EMPTY_PLAN,
    optics: slug(ctx.telescopeId ?? ctx.opticsId),
    corrector: ctx.telescopeId ? slug(ctx.opticsId) : null,
    camera: slug(ctx.cameraId),
    stations: ctx.stationIds.map(slug),
    filter: glass[0] ?? null,
    extraGlass: glass[1] ?? null,
    toleranceMm: request.backFocusToleranceMm ?? null,
    source: request.source?.kind === "owned" ? "owned" : "catalog",
    alt: solutionIndex,
  };
  return `/plan?${planStateToParams(state).toString()}`;
}
