"use client";
// The builds JSON API from the browser: the server's own words on failure.

export type ApiFailure = { ok: false; status: number; message: string; fields?: Record<string, string[]> };
export type ApiResult<T> = { ok: true; status: number; data: T } | ApiFailure;

export async function callBuildsApi<T = unknown>(method: "GET" | "POST" | "PATCH" | "DELETE", path: string, body?: unknown): Promise<ApiResult<T>> {
  let res: Response;
  try {
    res = await fetch(path, {
      method,
      headers: body === undefined ? undefined : { "content-type": "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    return { ok: false, status: 0, message: "Trainyard could not be reached. Check the connection and try again." };
  }
  const text = await res.text();
  let json: unknown = null;
  try { json = text ? JSON.parse(text) : null; } catch { /* described below */ }
  if (!res.ok) {
    const e = (json as { error?: { message?: string; fields?: Record<string, string[]> } } | null)?.error;
    return { ok: false, status: res.status, message: e?.message ?? `The server answered ${res.status}.`, fields: e?.fields };
  }
  return { ok: true, status: res.status, data: json as T };
}
