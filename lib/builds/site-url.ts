// Absolute addresses for links that leave the site (share snippets, og:image, API `url`).

import { configuredSiteUrl, trustedOrigins } from "@/lib/http/origin";

/**
 * The configured site URL (BETTER_AUTH_URL). A request's Host decides only between the
 * trusted spellings of this same site (127.0.0.1 or localhost); X-Forwarded-Host and any
 * other host never decide a link that leaves the site (issue 16).
 */
export function siteOrigin(h: Headers | null): string {
  const configured = configuredSiteUrl();
  const host = h?.get("host");
  if (!host) return configured;
  const asked = `${new URL(configured).protocol}//${host}`;
  return trustedOrigins().includes(asked) ? asked : configured;
}

export const buildPath = (slug: string) => `/b/${slug}`;
export const buildUrl = (origin: string, slug: string) => `${origin}${buildPath(slug)}`;
/** The preview image (Next's opengraph-image file convention beside /b/[slug]). */
export const buildImageUrl = (origin: string, slug: string) => `${origin}${buildPath(slug)}/opengraph-image`;
