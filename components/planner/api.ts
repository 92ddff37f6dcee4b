"use client";
// The planner's reads of the catalog API (through the shared client in components/api-client).
import { useQuery } from "@tanstack/react-query";
import { ApiError, fetchJson } from "@/components/api-client";
import type { ApiPart } from "@/lib/catalog/part-json";

export type PartsPage = { items: ApiPart[]; nextCursor: string | null };

/** One catalog part by slug, cached; pickers seed this cache when a part is chosen. */
export function usePart(slug: string | null) {
  return useQuery({
    queryKey: ["part", slug],
    queryFn: ({ signal }) => fetchJson<ApiPart>(`/api/v1/parts/${encodeURIComponent(slug!)}`, { signal }),
    enabled: !!slug,
    staleTime: 5 * 60_000,
    retry: (count, err) => !(err instanceof ApiError && err.status === 404) && count < 1,
  });
}

export async function searchParts(kinds: readonly string[], q: string, signal: AbortSignal): Promise<ApiPart[]> {
  const pages = await Promise.all(kinds.map((kind) => {
    const sp = new URLSearchParams({ kind, limit: kinds.length > 1 ? "25" : "60" });
    if (q.trim()) sp.set("q", q.trim());
    return fetchJson<PartsPage>(`/api/v1/parts?${sp}`, { signal });
  }));
  // Each kind comes back best match first; merge them by the server's match score.
  const items = pages.flatMap((p) => p.items as (ApiPart & { matchScore?: number })[]);
  return q.trim() ? items.sort((a, b) => (b.matchScore ?? 0) - (a.matchScore ?? 0)) : items;
}

export type CorrectorJoins = { telescope: string; correctors: { slug: string; joins: boolean; adapters: number }[] };

/** Which catalog correctors join this telescope (directly or through catalog adapters). */
export function useCorrectorJoins(telescope: string | null) {
  return useQuery({
    queryKey: ["corrector-joins", telescope],
    queryFn: ({ signal }) => fetchJson<CorrectorJoins>(`/api/v1/parts/${encodeURIComponent(telescope!)}/correctors`, { signal }),
    enabled: !!telescope,
    staleTime: 5 * 60_000,
  });
}
