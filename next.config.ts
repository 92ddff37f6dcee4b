import type { NextConfig } from "next";
import { COMMON_SECURITY_HEADERS } from "./lib/http/security-headers";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // Lets two servers run from one checkout (NEXT_DIST_DIR=.next-b npm run dev).
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  typedRoutes: false,
  serverExternalPackages: ["pg", "nodemailer", "smtp-server", "s3rver", "mailparser", "piscina", "rate-limiter-flexible"],
  images: { unoptimized: true },
  // The app build checks the app's own files; `npm run typecheck` (run by npm test) checks everything.
  typescript: { tsconfigPath: "tsconfig.app.json" },
  // Pages get their nonce CSP from proxy.ts; API answers (JSON, spec sheets, images) are
  // never documents to run, so they get a policy that allows nothing.
  async headers() {
    return [
      { source: "/:path*", headers: COMMON_SECURITY_HEADERS },
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: "default-src 'none'; frame-ancestors 'none'; sandbox" }] },
    ];
  },
};

export default nextConfig;
