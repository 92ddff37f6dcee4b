// A path with broken percent-encoding (/parts/%FF, /api/v1/builds/%ZZ) names nothing: answer
// before Next.js tries to decode it into route params (which fails as a plain-text 500).
export function isMalformedPath(pathname: string): boolean {
  try {
    decodeURIComponent(pathname);
    return false;
  } catch {
    return true;
  }
}

export function malformedPathResponse(pathname: string): Response {
  const api = pathname.startsWith("/api/");
  return Response.json(
    { error: { code: api ? "bad_request:path" : "not_found", message: "This address is not valid (broken percent-encoding)." } },
    { status: api ? 400 : 404 },
  );
}
