"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import type { ShopNavEntry } from "@/lib/shops/dashboard-nav";

export function ShopNav({ entries }: { entries: ShopNavEntry[] }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Shop dashboard" className="-mx-1 flex gap-1 overflow-x-auto pb-1 text-sm lg:mx-0 lg:flex-col lg:overflow-visible">
      {entries.map((e) => {
        const active = e.href === "/shop" ? pathname === "/shop" : pathname === e.href || pathname.startsWith(`${e.href}/`);
        return (
          <Link key={e.href} href={e.href} aria-current={active ? "page" : undefined}
            className={`whitespace-nowrap rounded-md px-3 py-2 transition-colors ${active ? "bg-surface font-medium text-ink shadow-[inset_3px_0_0_var(--c-brass)] ring-1 ring-line" : "text-text hover:bg-sunken"}`}>
            {e.label}
          </Link>
        );
      })}
    </nav>
  );
}
