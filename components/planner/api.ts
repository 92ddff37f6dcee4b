"use client";
// Talking to the JSON API from the planner: one error type that keeps the server's words.
import { useQuery } from "@tanstack/react-query";
import type { ApiPart } from "@/lib/catalog/rows";

export class ApiError extends Error {
  constructor(message: string, readonly status: number, readonly code: string, readonly fields?: Record<string, string[]>) {
    super(message);
  }
}

export async function fetchJson<T>(url: string, init?: RequestInit): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, init);
  } catch (err) {
    if ((err as Error).name === "AbortError") throw err;
    throw new ApiError("Trainyard could not be reached. Check the connection and try again.", 0, "network");
  }
  const text = await res.text();
  let body: unknown = null;
  try { body = text ? JSON.parse(text) : null; } catch { /* not JSON: described below */ }
  if (!res.ok) {
    const e = (body as { error?: { code?: string; message?: string; fields?: Record<string, string[]> } } | null)?.error;
    const message = e?.message ?? (res.status >= 500 ? `The server had a problem (${res.status}). Try again in a moment.` : `The server answered ${res.status}.`);
    throw new ApiError(message, res.status, e?.code ?? String(res.status), e?.fields);
  }
  if (body === null) throw new ApiError("The server sent an answer that is not JSON.", res.status, "bad_json");
  return body as T;
}

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
