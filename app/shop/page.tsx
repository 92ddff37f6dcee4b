import Link from "next/link";
import { PageTitle } from "@/components/ui/card";
import { listInventory } from "@/db/queries/shops-inventory";
import { dashboardShopOrNull } from "@/lib/shops/dashboard";
import { formatMoney } from "@/lib/shops/money";
import { stockNextForShop } from "@/lib/shops/stock-next-query";

export const metadata = { title: "Shop dashboard" };

function Stat({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <div className="rounded-lg border border-line bg-surface p-4">
      <p className="text-xs uppercase tracking-wide text-muted">{label}</p>
      <p className="num mt-1 text-2xl font-semibold text-ink">{value}</p>
      {note ? <p className="mt-0.5 text-xs text-muted">{note}</p> : null}
    </div>
  );
}

export default async function ShopOverview() {
  const ctx = await dashboardShopOrNull();
  if (!ctx) return null;
  const { shop } = ctx;
  const [items, next] = await Promise.all([listInventory({ organizationId: shop.id }), stockNextForShop({ organizationId: shop.id })]);
  const available = items.reduce((s, i) => s + i.onHand - i.reserved, 0);
  const soldOut = items.filter((i) => i.onHand - i.reserved <= 0).length;
  const reserved = items.reduce((s, i) => s + i.reserved, 0);
  const value = items.filter((i) => i.currency === shop.currency).reduce((s, i) => s + i.priceCents * (i.onHand - i.reserved), 0);
  return (
    <div className="space-y-6">
      <PageTitle title={shop.name} lead={`${shop.location ?? ""}${shop.location ? " · " : ""}what you stock answers the planner for anyone who picks your shop.`} />
      <div className="grid gap-3 sm:grid-cols-2 xl:grid-cols-4">
        <Stat label="Lines stocked" value={String(items.length)} note={`${soldOut} sold out`} />
        <Stat label="Units available" value={String(available)} note="on hand − reserved" />
        <Stat label="Reserved for orders" value={String(reserved)} />
        <Stat label="Available stock at your prices" value={formatMoney(value, shop.currency)} />
      </div>
      <div className="grid gap-4 lg:grid-cols-2">
        <section className="rounded-lg border border-line bg-surface p-5">
          <h2 className="font-semibold text-ink">Keep the stock true</h2>
          <p className="mt-1 text-sm text-muted">Edit lines in place, or import a CSV from your till. Nothing is written until you confirm the preview.</p>
          <div className="mt-3 flex flex-wrap gap-3 text-sm">
            <Link href="/shop/inventory" className="underline decoration-brass underline-offset-4">Edit the inventory</Link>
            <Link href="/shop/import" className="underline decoration-brass underline-offset-4">Import a CSV</Link>
            <a href={`/api/v1/shops/${shop.slug}/inventory/export`} className="underline decoration-brass underline-offset-4">Export as CSV</a>
          </div>
        </section>
        <section className="rounded-lg border border-line bg-surface p-5">
          <h2 className="font-semibold text-ink">What to stock next</h2>
          {next.suggestions.length ? (
            <ol className="mt-2 space-y-1 text-sm">
              {next.suggestions.slice(0, 3).map((s) => (
                <li key={s.partId} className="flex justify-between gap-3"><Link href={`/parts/${s.part.slug}`} className="hover:underline">{s.part.maker} {s.part.model}</Link><span className="num text-muted">would answer {s.completes || s.needed}</span></li>
              ))}
            </ol>
          ) : <p className="mt-1 text-sm text-muted">No unanswered questions in the last {next.days} days.</p>}
          <Link href="/shop/stock-next" className="mt-3 inline-block text-sm underline decoration-brass underline-offset-4">See the full list</Link>
        </section>
      </div>
    </div>
  );
}
