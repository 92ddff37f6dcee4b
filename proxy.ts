import { NextResponse, type NextRequest } from "next/server";

// Only redirects signed-out visitors away from account pages; every page and handler
// re-checks the session itself.
export function proxy(request: NextRequest) {
  const hasSession = request.cookies.getAll().some((c) => c.name.endsWith("better-auth.session_token"));
  if (!hasSession) {
    const url = new URL("/sign-in", request.url);
    url.searchParams.set("next", request.nextUrl.pathname);
    return NextResponse.redirect(url);
  }
  return NextResponse.next();
}

export const config = { matcher: ["/account/:path*", "/review/:path*", "/parts/submit"] };
