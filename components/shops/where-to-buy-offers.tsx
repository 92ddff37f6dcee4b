// The "where to buy" list: per shop, its total in its currency and what it lacks. No hooks:
// used by the planner's panel (client) and the build page (server).
import Link from "next/link";
import type { ShopOffer } from "@/lib/shops/where-to-buy";
import { formatMoney } from "@/lib/shops/money";

export function WhereToBuyOffers({ offers, partsCount }: { offers: ShopOffer[]; partsCount: number }) {
  if (!offers.length) return <p className="text-sm text-muted">No shop on Trainyard stocks any of these parts right now.</p>;
  return (
    <ul className="space-y-2">
      {offers.map((o) => (
        <li key={o.shop.slug} className={`rounded-md border px-3 py-2.5 text-sm ${o.complete ? "border-ok/40 bg-ok/5" : "border-line bg-bg"}`}>
          <div className="flex flex-wrap items-baseline justify-between gap-2">
            <Link href={`/shops/${o.shop.slug}`} className="font-medium text-ink hover:underline">{o.shop.name}</Link>
            <span className="num font-semibold text-ink">{o.totals.map((t) => formatMoney(t.cents, t.currency)).join(" + ") || "—"}</span>
          </div>
          <p className={`mt-0.5 text-xs ${o.complete ? "text-ok" : "text-muted"}`}>
            {o.complete ? `Has all ${partsCount} part${partsCount === 1 ? "" : "s"}` : `Has ${o.supplied.length} of ${o.supplied.length + o.lacks.length}; the total covers those`}
          </p>
          {o.lacks.length ? (
            <ul className="mt-1 space-y-0.5 text-xs text-text">
              {o.lacks.map((l) => <li key={l.slug}><span className="text-bad">Lacks</span> {l.name}{l.available ? ` (has ${l.available}, needs ${l.needed})` : ""}</li>)}
            </ul>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
