import Link from "next/link";
import { listShopsStockingPart } from "@/db/queries/shops-inventory";
import { formatMoney } from "@/lib/shops/money";

/** On a part's page: the shops that have it available now, at their prices. */
export async function PartStockists({ partId }: { partId: string }) {
  const shops = await listShopsStockingPart({ partId });
  return (
    <section aria-labelledby="stockists-title" className="rounded-lg border border-line bg-surface p-5">
      <h2 id="stockists-title" className="font-semibold text-ink">In stock at</h2>
      {shops.length ? (
        <ul className="mt-2 divide-y divide-line/60 text-sm">
          {shops.map((s) => (
            <li key={s.shopSlug} className="flex flex-wrap items-baseline justify-between gap-3 py-2">
              <span><Link href={`/shops/${s.shopSlug}`} className="font-medium text-text hover:underline">{s.shopName}</Link>{s.location ? <span className="ml-2 text-xs text-muted">{s.location}</span> : null}</span>
              <span className="num text-ink">{formatMoney(s.priceCents, s.currency)} <span className="text-xs text-muted">· {s.available} available</span></span>
            </li>
          ))}
        </ul>
      ) : <p className="mt-1 text-sm text-muted">No shop on Trainyard has it in stock right now.</p>}
    </section>
  );
}
