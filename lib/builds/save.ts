import "server-only";
import { insertBuild } from "@/db/queries/builds";
import type { SessionUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import type { PlanResponse } from "@/lib/planner/api-types";
import { runPlan } from "@/lib/planner/run-plan";
import type { CreateBuildInput } from "@/lib/validation/builds";
import { collectPartIds } from "./chain";
import { parseBuildPlanRequest } from "./parse-request";

/** Solve the request again on the server and store that canonical result, never the client's. */
export async function saveBuild({ input, user }: { input: CreateBuildInput; user: SessionUser }): Promise<string> {
  const plan = parseBuildPlanRequest(input.request);
  const result = await runPlan({ input: plan, viewer: user });
  if (!("context" in result)) throw new AppError("bad_request:validation", "A build is made of catalog parts.", { "request.optics": ["Choose the optics from the catalog"] });
  const chain = result.solutions[input.solutionIndex];
  if (!chain) {
    const message = result.solutions.length === 0
      ? `This plan has no solution to save${result.reason ? `: ${result.reason}` : "."}`
      : `There are ${result.solutions.length} solutions: choose 0 to ${result.solutions.length - 1}.`;
    throw new AppError("bad_request:validation", message, { solutionIndex: [result.solutions.length ? `0 to ${result.solutions.length - 1}` : "No solution to save"] });
  }
  return insertBuild({
    ownerId: user.id,
    values: {
      title: input.title,
      notes: input.notes || null,
      visibility: input.visibility,
      request: plan,
      solutionIndex: input.solutionIndex,
      result: result satisfies PlanResponse,
      partIds: collectPartIds(result, chain),
      checkedCatalogVersion: result.context.catalogVersion,
    },
  });
}
