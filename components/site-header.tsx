import Link from "next/link";
import { allowed, getSessionUser } from "@/lib/auth/session";
import { listShopsOfUser } from "@/db/queries/shops";
import { Logo } from "./logo";
import { NavLinks } from "./nav-links";
import { NightToggle } from "./night-toggle";

export async function SiteHeader({ night }: { night: boolean }) {
  const user = await getSessionUser().catch(() => null);
  const inShop = user ? (await listShopsOfUser({ userId: user.id }).catch(() => [])).length > 0 : false;
  return (
    <header className="bg-header text-header-text night:border-b night:border-line">
      <div className="mx-auto flex max-w-[1400px] flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3 sm:px-6">
        <Link href="/" className="flex items-center gap-2.5 font-semibold tracking-tight">
          <Logo className="h-4 w-11" />
          <span className="text-lg">Trainyard</span>
        </Link>
        <NavLinks
          links={[
            { href: "/plan", label: "Planner" },
            { href: "/parts", label: "Parts" },
            { href: "/builds", label: "Builds" },
            { href: "/shops", label: "Shops" },
            ...(inShop ? [{ href: "/shop", label: "Your shop" }] : []),
            ...(allowed(user, { part: "review" }) || allowed(user, { build: "moderate" }) ? [{ href: "/review", label: "Review" }] : []),
            { href: user ? "/account" : "/sign-in", label: user ? "Account" : "Sign in" },
          ]}
        />
        <div className="ml-auto flex items-center gap-3 text-sm">
          {user ? (
            <span className="hidden text-header-text/80 sm:inline" title={user.email}>
              {user.name}
              {user.role !== "member" && <span className="ml-1.5 rounded bg-brass/25 px-1.5 py-0.5 text-xs uppercase tracking-wide text-header-text night:bg-transparent night:ring-1 night:ring-brass">{user.role}</span>}
            </span>
          ) : null}
          <NightToggle initial={night} />
        </div>
      </div>
    </header>
  );
}
