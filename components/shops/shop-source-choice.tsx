"use client";
// The planner's "Draw the parts from" option for one shop's stock, with "what I own first".
import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { fetchJson } from "@/components/api-client";

type ShopListItem = { slug: string; name: string; currency: string; inStock: number; location: string | null };
type Patch = { source?: "shop"; shop?: string | null; shopOwned?: boolean };

export function useShops() {
  return useQuery({ queryKey: ["shops"], queryFn: () => fetchJson<{ shops: ShopListItem[] }>("/api/v1/shops"), staleTime: 60_000 });
}

export function ShopSourceChoice({ name, radioClass, active, shop, shopOwned, signedIn, onChange }: {
  name: string; radioClass: string; active: boolean; shop: string | null; shopOwned: boolean; signedIn: boolean; onChange: (p: Patch) => void;
}) {
  const shops = useShops().data?.shops.filter((s) => s.inStock > 0) ?? [];
  const chosen = shops.find((s) => s.slug === shop);
  return (
    <div className="flex items-start gap-2">
      <input id={`${name}-shop`} type="radio" name={name} className={radioClass} checked={active} disabled={!shops.length}
        onChange={() => onChange({ source: "shop", shop: shop ?? shops[0]?.slug ?? null })} />
      <div className="min-w-0 flex-1">
        <label htmlFor={`${name}-shop`} className="cursor-pointer">A shop&apos;s stock
          <span className="block text-xs text-muted">Only what the shop has available now, at its prices.</span>
        </label>
        {active ? (
          <div className="mt-1.5 space-y-1.5">
            <select aria-label="Shop" value={shop ?? ""} onChange={(e) => onChange({ source: "shop", shop: e.target.value })}
              className="w-full rounded-md border border-line bg-bg px-2 py-1.5 text-sm">
              {shops.map((s) => <option key={s.slug} value={s.slug}>{s.name} · {s.inStock} parts · {s.currency}</option>)}
            </select>
            {chosen ? <Link href={`/shops/${chosen.slug}`} className="text-xs text-muted underline underline-offset-2">What {chosen.name} stocks</Link> : null}
            <label className={`flex items-center gap-2 text-xs ${signedIn ? "cursor-pointer" : "text-muted"}`}>
              <input type="checkbox" checked={shopOwned && signedIn} disabled={!signedIn} onChange={(e) => onChange({ shopOwned: e.target.checked })} />
              Count what I own first{signedIn ? "" : " (sign in)"}
            </label>
          </div>
        ) : null}
      </div>
    </div>
  );
}
