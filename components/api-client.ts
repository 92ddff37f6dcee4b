"use client";
// Talking to the JSON API from the browser, in one place: a failure keeps the server's own
// words from its `{ error: { code, message, fields? } }` body (lib/errors.ts).
import type { ErrorBody } from "@/lib/errors";

export type ApiFields = Record<string, string[]>;

export class ApiError extends Error {
  constructor(message: string, readonly status: number, readonly code: string, readonly fields?: ApiFields) {
    super(message);
  }
}

export type ApiFailure = { ok: false; status: number; code: string; message: string; fields?: ApiFields };
export type ApiResult<T> = { ok: true; status: number; data: T } | ApiFailure;

const UNREACHABLE = "Trainyard could not be reached. Check the connection and try again.";

/** Never throws but for an abort: the answer's JSON, or the failure in the server's words. */
export async function apiRequest<T>(url: string, init?: RequestInit): Promise<ApiResult<T | null>> {
  let res: Response;
  try {
    res = await fetch(url, init);
  } catch (err) {
    if ((err as Error).name === "AbortError") throw err;
    return { ok: false, status: 0, code: "network", message: UNREACHABLE };
  }
  const text = await res.text();
  let body: unknown = null;
  try { body = text ? JSON.parse(text) : null; } catch { /* not JSON: null, described by the caller or below */ }
  if (!res.ok) {
    const e = (body as Partial<ErrorBody> | null)?.error;
    const message = e?.message ?? (res.status >= 500 ? `The server had a problem (${res.status}). Try again in a moment.` : `The server answered ${res.status}.`);
    return { ok: false, status: res.status, code: e?.code ?? String(res.status), message, fields: e?.fields };
  }
  return { ok: true, status: res.status, data: body as T | null };
}

/** The answer's JSON, or an ApiError (for TanStack Query's queryFn and mutationFn). */
export async function fetchJson<T>(url: string, init?: RequestInit): Promise<T> {
  const result = await apiRequest<T>(url, init);
  if (!result.ok) throw new ApiError(result.message, result.status, result.code, result.fields);
  if (result.data === null) throw new ApiError("The server sent an answer that is not JSON.", result.status, "bad_json");
  return result.data;
}

/** A JSON request (body sent as JSON when given); never throws. A 204 answers `data: null`. */
export function callApi<T = unknown>(method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE", path: string, body?: unknown): Promise<ApiResult<T>> {
  return apiRequest<T>(path, {
    method,
    headers: body === undefined ? undefined : { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  }) as Promise<ApiResult<T>>;
}
