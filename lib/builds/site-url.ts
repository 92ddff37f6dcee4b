// Absolute addresses for links that leave the site (share snippets, og:image, API `url`).

/** The origin the visitor used (Host header), else BETTER_AUTH_URL. */
export function siteOrigin(h: Headers | null): string {
  const configured = process.env.BETTER_AUTH_URL ?? `http://127.0.0.1:${process.env.PORT ?? 3000}`;
  const host = h?.get("x-forwarded-host") ?? h?.get("host");
  if (!host || !/^[A-Za-z0-9.-]+(:\d{1,5})?$|^\[[0-9a-fA-F:]+\](:\d{1,5})?$/.test(host)) return configured.replace(/\/$/, "");
  const proto = h?.get("x-forwarded-proto")?.split(",")[0]?.trim() || new URL(configured).protocol.replace(":", "");
  return `${proto === "https" ? "https" : "http"}://${host}`;
}

export const buildPath = (slug: string) => `/b/${slug}`;
export const buildUrl = (origin: string, slug: string) => `${origin}${buildPath(slug)}`;
/** The preview image (Next's opengraph-image file convention beside /b/[slug]). */
export const buildImageUrl = (origin: string, slug: string) => `${origin}${buildPath(slug)}/opengraph-image`;
