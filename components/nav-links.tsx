"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";

export function NavLinks({ links }: { links: { href: string; label: string }[] }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Main" className="order-last flex w-full gap-1 overflow-x-auto text-sm sm:order-none sm:w-auto">
      {links.map((l) => {
        const active = pathname === l.href || pathname.startsWith(`${l.href}/`);
        return (
          <Link key={l.href} href={l.href} aria-current={active ? "page" : undefined}
            className={`rounded-md px-3 py-1.5 whitespace-nowrap transition-colors ${active ? "bg-white/10 text-header-text shadow-[inset_0_-2px_0_var(--c-brass)] night:bg-transparent" : "text-header-text/80 hover:bg-white/5 hover:text-header-text"}`}>
            {l.label}
          </Link>
        );
      })}
    </nav>
  );
}
