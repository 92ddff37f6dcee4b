import Link from "next/link";
import { OrdersTable } from "@/components/orders/orders-table";
import { PageTitle } from "@/components/ui/card";
import { listBuyerQuotes } from "@/db/queries/orders";
import { requireUser } from "@/lib/signed-in";

export const metadata = { title: "Your orders" };

export default async function AccountOrdersPage() {
  const user = await requireUser("/account/orders");
  const rows = await listBuyerQuotes({ buyerId: user.id });
  return (
    <div>
      <nav className="mb-3 text-sm text-muted"><Link href="/account" className="underline-offset-4 hover:underline">Account</Link> / orders</nav>
      <PageTitle title="Your quotes and orders" lead="Every quote you asked a shop for, and what became of it: quoted, paid, shipped." />
      <OrdersTable counterpartLabel="Shop" rows={rows.map((r) => ({ ...r, counterpart: r.shopName, href: `/quotes/${r.id}` }))}
        empty={<>No quotes yet. Open one of <Link href="/builds?mine=1" className="underline decoration-brass underline-offset-4">your builds</Link> and press “Ask a shop for a quote”.</>} />
    </div>
  );
}
