"use client";
// The planner's "Where to buy": which shops can supply the connecting parts still to buy.
import { useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/components/api-client";
import type { ShopOffer } from "@/lib/shops/where-to-buy";
import { WhereToBuyOffers } from "./where-to-buy-offers";

export type BuyLine = { slug: string; name: string; count: number };

export function WhereToBuyPanel({ lines }: { lines: BuyLine[] }) {
  const parts = lines.map((l) => ({ slug: l.slug, quantity: l.count }));
  const q = useQuery({
    queryKey: ["where-to-buy", parts],
    enabled: parts.length > 0,
    queryFn: ({ signal }) => fetchJson<{ offers: ShopOffer[] }>("/api/v1/shops/where-to-buy", {
      method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ parts }), signal,
    }),
  });
  return (
    <section aria-labelledby="where-to-buy" className="rounded-lg border border-line bg-surface p-4 sm:p-5">
      <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="where-to-buy" className="text-base font-semibold text-ink">Where to buy</h2>
        <span className="text-xs text-muted">shops&apos; own prices and stock</span>
      </div>
      {!parts.length ? <p className="text-sm text-muted">Nothing to buy: every connecting part is owned.</p>
        : q.error ? <p className="text-sm text-bad">{q.error.message}</p>
          : !q.data ? <div className="h-16 animate-pulse rounded-md bg-sunken" />
            : <WhereToBuyOffers offers={q.data.offers} partsCount={lines.length} />}
    </section>
  );
}
