import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // Lets two servers run from one checkout (NEXT_DIST_DIR=.next-b npm run dev).
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  typedRoutes: false,
  serverExternalPackages: ["pg", "nodemailer", "smtp-server", "s3rver", "mailparser"],
  images: { unoptimized: true },
  // The app build checks the app's own files; `npm run typecheck` (run by npm test) checks everything.
  typescript: { tsconfigPath: "tsconfig.app.json" },
};

export default nextConfig;
