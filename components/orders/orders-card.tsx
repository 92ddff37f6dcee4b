import Link from "next/link";
import { Card } from "@/components/ui/card";

/** Account page: the buyer's quotes and orders, and the shop's when the user works for one. */
export function OrdersCard({ shopMember }: { shopMember: boolean }) {
  return (
    <Card>
      <h2 className="font-medium text-ink">Quotes and orders</h2>
      <p className="mt-1 text-sm text-muted">Quotes you asked shops for, what you paid, what has shipped.</p>
      <div className="mt-3 flex flex-wrap gap-x-4 gap-y-1 text-sm">
        <Link href="/account/orders" className="underline decoration-brass underline-offset-4">See my orders</Link>
        {shopMember ? <Link href="/shop/orders" className="underline decoration-brass underline-offset-4">My shop&rsquo;s orders</Link> : null}
      </div>
    </Card>
  );
}
