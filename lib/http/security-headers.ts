// The Content-Security-Policy for pages (a fresh nonce per request, Next's documented way)
// and the headers every response carries. Kept apart from proxy.ts so tests can read it.

export function contentSecurityPolicy(nonce: string, opts: { dev: boolean }): string {
  return [
    "default-src 'self'",
    // 'strict-dynamic': scripts the nonced Next.js runtime loads are trusted; nothing else runs.
    // React needs eval only in development (its debugging stacks); production has no eval.
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${opts.dev ? " 'unsafe-eval'" : ""}`,
    // React Flow and the to-scale strips position elements with style attributes.
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    `connect-src 'self'${opts.dev ? " ws: wss:" : ""}`,
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    // No page is meant to be embedded in another site's frame.
    "frame-ancestors 'none'",
  ].join("; ");
}

/** Headers for every response (pages and API), set in next.config.ts. */
export const COMMON_SECURITY_HEADERS = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
];

/** HSTS only when the visitor came over HTTPS (directly or through a trusted proxy). */
export const HSTS = "max-age=31536000; includeSubDomains";
