import { NextResponse, type NextRequest } from "next/server";
import { contentSecurityPolicy, HSTS } from "@/lib/http/security-headers";

const PRIVATE = [/^\/account(\/|$)/, /^\/review(\/|$)/, /^\/parts\/submit$/];

// Two jobs on page requests: a Content-Security-Policy with a fresh nonce (Next.js reads it
// from the request header and puts the nonce on its own scripts), and sending signed-out
// visitors away from account pages. Every page and handler still re-checks the session.
export function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  if (PRIVATE.some((re) => re.test(pathname))) {
    const hasSession = request.cookies.getAll().some((c) => c.name.endsWith("better-auth.session_token"));
    if (!hasSession) {
      const url = new URL("/sign-in", request.url);
      url.searchParams.set("next", pathname);
      return NextResponse.redirect(url);
    }
  }
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const csp = contentSecurityPolicy(nonce, { dev: process.env.NODE_ENV === "development" });
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("content-security-policy", csp);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("content-security-policy", csp);
  // X-Forwarded-Proto survives only from a trusted proxy (lib/dev/serve.ts).
  if (request.headers.get("x-forwarded-proto") === "https" || request.nextUrl.protocol === "https:") {
    response.headers.set("strict-transport-security", HSTS);
  }
  return response;
}

export const config = {
  matcher: [{
    source: "/((?!api|_next/static|_next/image|favicon.ico|icon|apple-icon).*)",
    missing: [{ type: "header", key: "next-router-prefetch" }, { type: "header", key: "purpose", value: "prefetch" }],
  }],
};
