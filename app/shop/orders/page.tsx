import Link from "next/link";
import { redirect } from "next/navigation";
import { OrdersTable } from "@/components/orders/orders-table";
import { PageTitle } from "@/components/ui/card";
import { listMemberShops, listShopQuotes } from "@/db/queries/orders";
import { getSessionUser } from "@/lib/auth/session";

export const metadata = { title: "Shop orders" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };
const OPEN = new Set(["requested", "paid"]);
const COUNTERS = [
  { label: "To answer", statuses: ["requested"] }, { label: "Quoted, not paid", statuses: ["quoted", "awaiting_payment"] },
  { label: "To ship", statuses: ["paid"] }, { label: "Shipped", statuses: ["shipped"] },
];

export default async function ShopOrdersPage({ searchParams }: Props) {
  const user = await getSessionUser();
  if (!user) redirect("/sign-in?next=/shop/orders");
  const shops = await listMemberShops({ userId: user.id });
  if (!shops.length) return <PageTitle title="Shop orders" lead="This page is for a shop's owner and staff; your account belongs to no shop." />;
  const wanted = (await searchParams).shop;
  const shop = shops.find((s) => s.slug === wanted) ?? shops[0];
  const rows = await listShopQuotes({ organizationId: shop.id });
  const waiting = rows.filter((r) => OPEN.has(r.status)).length;
  return (
    <div>
      <PageTitle title={`${shop.name}: quotes and orders`} lead={waiting ? `${waiting} waiting on you: requests to answer and paid orders to ship.` : "Nothing waiting on you right now."}>
        {shops.length > 1 ? (
          <nav aria-label="Your shops" className="flex flex-wrap gap-1 text-sm">
            {shops.map((s) => <Link key={s.slug} href={`/shop/orders?shop=${s.slug}`} aria-current={s.slug === shop.slug ? "page" : undefined} className={`rounded-md border px-3 py-1.5 ${s.slug === shop.slug ? "border-brass bg-brass/10 text-ink" : "border-line text-muted hover:border-brass"}`}>{s.name}</Link>)}
          </nav>
        ) : null}
      </PageTitle>
      <dl className="mb-4 grid grid-cols-2 gap-px overflow-hidden rounded-lg border border-line bg-line text-sm sm:grid-cols-4">
        {COUNTERS.map((c) => (
          <div key={c.label} className="bg-surface px-4 py-3">
            <dt className="text-xs uppercase tracking-wide text-muted">{c.label}</dt>
            <dd className="num mt-0.5 text-2xl font-semibold text-ink">{rows.filter((r) => c.statuses.includes(r.status)).length}</dd>
          </div>
        ))}
      </dl>
      <OrdersTable counterpartLabel="Buyer" rows={rows.map((r) => ({ ...r, counterpart: r.buyerName, href: `/shop/orders/${r.id}` }))}
        empty="No quote requests yet. Buyers ask from a saved build's page; each request arrives here and by e-mail." />
    </div>
  );
}
