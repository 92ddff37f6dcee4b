// Small corrections to better-auth's answers, applied in app/api/auth/[...all]/route.ts.

// Organization routes that answer 400 when the caller is not a member at all: that is a
// refusal, so it leaves as 403 (issue 16).
const NOT_A_MEMBER = new Set(["USER_IS_NOT_A_MEMBER_OF_THE_ORGANIZATION", "MEMBER_NOT_FOUND"]);

export async function adjustAuthResponse(request: Request, response: Response): Promise<Response> {
  const headers = new Headers(response.headers);
  // better-auth says X-Retry-After; HTTP clients look for Retry-After.
  const retry = headers.get("x-retry-after");
  if (response.status === 429 && retry && !headers.has("retry-after")) {
    headers.set("retry-after", retry);
    return new Response(response.body, { status: 429, statusText: response.statusText, headers });
  }
  if (response.status === 400 && new URL(request.url).pathname.includes("/organization/")) {
    const text = await response.text();
    let code = "";
    try { code = (JSON.parse(text) as { code?: string }).code ?? ""; } catch { /* not JSON */ }
    return new Response(text, { status: NOT_A_MEMBER.has(code) ? 403 : 400, statusText: NOT_A_MEMBER.has(code) ? "Forbidden" : response.statusText, headers });
  }
  return response;
}
