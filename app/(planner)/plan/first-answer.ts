import "server-only";
// The answer in the first paint: the page solves the plan in its link on the server, with the
// same runPlan as POST /api/v1/solve, and hands the planner's query cache the answer and the
// chosen parts, under the very keys the planner asks for. The client then takes over for edits.
import { dehydrate, QueryClient, type DehydratedState } from "@tanstack/react-query";
import { getApprovedPartsByRefs } from "@/db/queries/parts";
import { listPublicShops } from "@/db/queries/shops";
import { correctorJoins } from "@/lib/planner/corrector-joins";
import type { SessionUser } from "@/lib/auth/session";
import { rowToApiPart } from "@/lib/catalog/part-json";
import { runPlan, type PlanInput } from "@/lib/planner/run-plan";
import { planStateToSolveRequest, type PlanState } from "@/lib/planner/url-state";
import { parsePlanRequest } from "@/lib/validation/plan";

/** JSON, as the API would send it, so the cache holds what a fetch would have put there. */
const asJson = <T,>(v: T): T => JSON.parse(JSON.stringify(v));

export async function firstAnswer({ state, viewer }: { state: PlanState; viewer: SessionUser | null }): Promise<DehydratedState | null> {
  const client = new QueryClient();
  const slugs = [state.optics, state.corrector, state.camera, ...state.stations].filter((s): s is string => !!s);
  if (!slugs.length) return null;
  const rows = await getApprovedPartsByRefs({ refs: slugs });
  for (const row of rows) client.setQueryData(["part", row.slug], asJson(rowToApiPart(row)));
  // What the form itself needs to draw its choices (the shop list, which correctors join the
  // telescope), fetched beside the solve so the page waits only for the slower of them.
  const optics = rows.find((r) => r.slug === state.optics);
  const side = Promise.all([
    listPublicShops().then((shops) => client.setQueryData(["shops"], asJson({ shops }))),
    optics?.specs.opticsRole === "telescope"
      ? correctorJoins({ telescope: optics.slug }).then((j) => client.setQueryData(["corrector-joins", optics.slug], asJson(j)))
      : null,
  ]).catch(() => { /* the planner asks the API for them instead */ });

  // As the planner does: a link asking for owned parts solves with the catalog until sign-in.
  const request = planStateToSolveRequest(state.source === "owned" && !viewer ? { ...state, source: "catalog" } : state);
  const parsed = request ? parsePlanRequest(request) : null;
  if (request && parsed?.success) {
    try {
      const result = await runPlan({ input: parsed.data as PlanInput, viewer });
      client.setQueryData(["solve", JSON.stringify(request)], asJson(result));
    } catch {
      // A bad link (unknown part, not a corrector…): the planner asks the API and shows its message.
    }
  }
  await side;
  return dehydrate(client);
}
