import { NextResponse, type NextRequest } from "next/server";
import { isMalformedPath, malformedPathResponse } from "@/lib/malformed-path";

const SIGNED_IN_ONLY = /^\/(account|review)(\/|$)|^\/parts\/submit$/;

// Refuses broken percent-encoding, and redirects signed-out visitors away from account pages;
// every page and handler re-checks the session itself.
export function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  if (isMalformedPath(pathname)) return malformedPathResponse(pathname);
  if (!SIGNED_IN_ONLY.test(pathname)) return NextResponse.next();
  const hasSession = request.cookies.getAll().some((c) => c.name.endsWith("better-auth.session_token"));
  if (!hasSession) {
    const url = new URL("/sign-in", request.url);
    url.searchParams.set("next", pathname);
    return NextResponse.redirect(url);
  }
  return NextResponse.next();
}

// The account pages, and any address holding a percent sign (the only ones that can be badly
// encoded): the hot API routes skip the proxy entirely.
export const config = { matcher: ["/account/:path*", "/review/:path*", "/parts/submit", "/((?!_next/).*%.*)"] };
