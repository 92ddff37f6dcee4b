"use client";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import type { PlanResponse } from "@/lib/planner/api-types";
import type { SolveApiRequest } from "@/lib/planner/url-state";
import { fetchJson } from "@/components/api-client";
import { useDebounce } from "use-debounce";

/**
 * POST /api/v1/solve whenever the question settles (debounced; the first question goes at
 * once, so a link solves on load). Keeps the previous answer on screen while the next is on its way.
 */
export function useSolve(request: SolveApiRequest | null) {
  const body = request ? JSON.stringify(request) : null;
  const [settled] = useDebounce(body, 350);
  const query = useQuery({
    queryKey: ["solve", settled],
    queryFn: ({ signal }) => fetchJson<PlanResponse>("/api/v1/solve", {
      method: "POST", headers: { "content-type": "application/json" }, body: settled!, signal,
    }),
    enabled: settled !== null,
    placeholderData: keepPreviousData,
    retry: false,
    staleTime: 60_000,
  });
  const asked = body !== null;
  return {
    asked,
    data: asked ? query.data : undefined,
    error: asked && !query.isFetching && body === settled ? query.error : null,
    /** A newer question than the answer on screen is being worked out. */
    working: asked && (body !== settled || query.isFetching),
    stale: asked && (body !== settled || query.isPlaceholderData),
    retry: () => void query.refetch(),
  };
}
