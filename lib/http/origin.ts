// Which origins may write: the configured site URL and the two loopback spellings of it.
import { AppError } from "@/lib/errors";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/** The configured site URL (BETTER_AUTH_URL), without a trailing slash. Links are built from it, never from request headers. */
export function configuredSiteUrl(): string {
  return (process.env.BETTER_AUTH_URL ?? `http://127.0.0.1:${process.env.PORT ?? 3000}`).replace(/\/$/, "");
}

export function trustedOrigins(): string[] {
  const port = process.env.PORT ?? "3000";
  return [...new Set([new URL(configuredSiteUrl()).origin, `http://127.0.0.1:${port}`, `http://localhost:${port}`])];
}

/**
 * Refuse a state-changing request that a page on another origin made (403). Browsers send
 * Origin on every cross-origin POST/PATCH/DELETE, no-cors ones included; without Origin,
 * Sec-Fetch-Site still tells a cross-site request apart. Scripts and curl send neither and
 * carry no victim's cookie, so they pass.
 */
export function assertTrustedOrigin(request: Request): void {
  if (SAFE_METHODS.has(request.method.toUpperCase())) return;
  const origin = request.headers.get("origin");
  if (origin !== null) {
    if (!trustedOrigins().includes(origin)) throw new AppError("forbidden:origin", "This request came from a page outside Trainyard and was refused.");
    return;
  }
  const site = request.headers.get("sec-fetch-site");
  if (site && site !== "same-origin" && site !== "none") throw new AppError("forbidden:origin", "This request came from a page outside Trainyard and was refused.");
}
