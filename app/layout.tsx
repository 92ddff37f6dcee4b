import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import { cookies, headers } from "next/headers";
import { SiteHeader } from "@/components/site-header";
import { Providers } from "@/components/providers";
import "./globals.css";

const publicSans = localFont({ src: "./fonts/public-sans-var.woff2", variable: "--font-public-sans", weight: "100 900", display: "swap" });
const plexMono = localFont({
  src: [{ path: "./fonts/plex-mono-400.woff2", weight: "400" }, { path: "./fonts/plex-mono-500.woff2", weight: "500" }],
  variable: "--font-plex-mono", display: "swap",
});

export const metadata: Metadata = {
  title: { default: "Trainyard — imaging trains that reach focus", template: "%s · Trainyard" },
  description: "Find the adapters and spacers that join a telescope to a camera, joint by joint, at the right back focus.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1 };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  const night = (await cookies()).get("ty-theme")?.value === "night";
  const nonce = (await headers()).get("x-nonce") ?? undefined; // set by proxy.ts with the CSP
  return (
    <html lang="en" data-theme={night ? "night" : "day"} className={`${publicSans.variable} ${plexMono.variable}`}>
      {/* Before any bundle: zod would probe for eval (blocked by the CSP, and reported as a violation). */}
      {/* biome-ignore lint/security/noDangerouslySetInnerHtml: a constant string, no user input; carries the CSP nonce */}
      <head><script nonce={nonce} dangerouslySetInnerHTML={{ __html: "globalThis.__zod_globalConfig={jitless:true}" }} /></head>
      <body className="min-h-dvh bg-bg text-text">
        <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-surface focus:px-3 focus:py-2">Skip to content</a>
        <Providers>
          <SiteHeader night={night} />
          <main id="main" className="mx-auto w-full max-w-[1400px] px-4 pb-16 pt-6 sm:px-6">{children}</main>
        </Providers>
      </body>
    </html>
  );
}
