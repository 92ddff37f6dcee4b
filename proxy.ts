import { NextResponse, type NextRequest } from "next/server";
import { contentSecurityPolicy, HSTS } from "@/lib/http/security-headers";
import { isMalformedPath, malformedPathResponse } from "@/lib/malformed-path";
import { PAGE_PATH_HEADER } from "@/lib/page-path";

const PRIVATE = [/^\/account(\/|$)/, /^\/review(\/|$)/, /^\/parts\/submit$/];

// Three jobs: refuse broken percent-encoding (400/404 JSON, before a route decodes it); send
// signed-out visitors away from account pages; and give every page a Content-Security-Policy
// with a fresh nonce (Next.js reads it from the request header and puts it on its own scripts).
// Every page and handler still re-checks the session itself.
export function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  if (isMalformedPath(pathname)) return malformedPathResponse(pathname);
  if (pathname.startsWith("/api/")) return NextResponse.next();
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
  // The page's own path, for a layout that sends a stale session to sign in and back here (lib/signed-in).
  requestHeaders.set(PAGE_PATH_HEADER, pathname);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("content-security-policy", csp);
  // X-Forwarded-Proto survives only from a trusted proxy (lib/dev/serve.ts).
  if (request.headers.get("x-forwarded-proto") === "https" || request.nextUrl.protocol === "https:") {
    response.headers.set("strict-transport-security", HSTS);
  }
  return response;
}

// Pages (not prefetches, not static files), and any API address holding a percent sign (the
// only ones that can be badly encoded): the hot API routes skip the proxy entirely.
export const config = {
  matcher: [
    {
      source: "/((?!api|_next/static|_next/image|favicon.ico|icon|apple-icon).*)",
      missing: [{ type: "header", key: "next-router-prefetch" }, { type: "header", key: "purpose", value: "prefetch" }],
    },
    "/api/((?!_next/).*%.*)",
  ],
};
