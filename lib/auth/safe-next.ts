// Where to go after signing in: only a path on this site. "//evil.example", "/\evil.example",
// "https://evil.example" and tab- or newline-smuggled variants all resolve to another origin
// under the URL parser browsers use, so they fall back to the planner (issue 16).
const BASE = "http://trainyard.invalid";

export function safeNextPath(next: string | null | undefined, fallback = "/plan"): string {
  if (typeof next !== "string" || !next.startsWith("/")) return fallback;
  let url: URL;
  try { url = new URL(next, BASE); } catch { return fallback; }
  if (url.origin !== BASE) return fallback;
  return `${url.pathname}${url.search}${url.hash}`;
}
