import Link from "next/link";
import type { ReactNode } from "react";
import { ShopNav } from "@/components/shops/shop-nav";
import { requireDashboardShop } from "@/lib/shops/dashboard";
import { shopNavFor } from "@/lib/shops/dashboard-nav";
import { AppError } from "@/lib/errors";

// Every dashboard page is per shop member; its try/catch must never meet the build's prerender bail-out.
export const dynamic = "force-dynamic";

function NotAMember({ message }: { message: string }) {
  return (
    <div className="max-w-xl rounded-lg border border-line bg-surface p-6">
      <p className="text-[11px] font-medium uppercase tracking-[0.2em] text-brass-ink">Shop dashboard</p>
      <h1 className="mt-2 text-xl font-semibold text-ink">This part of Trainyard is for shops</h1>
      <p className="mt-2 text-muted">{message} A shop&apos;s owner can invite you by e-mail. Meanwhile, see <Link href="/shops" className="underline decoration-brass underline-offset-4">the shops</Link> and what they stock.</p>
    </div>
  );
}

export default async function ShopLayout({ children }: { children: ReactNode }) {
  let ctx;
  try {
    ctx = await requireDashboardShop();
  } catch (err) {
    if (err instanceof AppError && err.status === 403) return <NotAMember message={err.message} />;
    throw err;
  }
  const { shop, role, grants, shops } = ctx;
  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[220px_minmax(0,1fr)]">
      <aside className="space-y-4">
        <div className="rounded-lg border border-line bg-surface p-4">
          <p className="text-[11px] font-medium uppercase tracking-[0.2em] text-brass-ink">Your shop</p>
          <p className="mt-1 font-semibold text-ink">{shop.name}</p>
          <p className="text-xs text-muted"><span className="capitalize">{role}</span> · prices in <span className="code">{shop.currency}</span></p>
          <Link href={`/shops/${shop.slug}`} className="mt-2 inline-block text-xs underline decoration-brass underline-offset-4">Public page</Link>
          {shops.length > 1 ? (
            <form action="/shop/switch" method="get" className="mt-3">
              <label className="block text-xs text-muted" htmlFor="shop-switch">Switch shop</label>
              <div className="mt-1 flex gap-1">
                <select id="shop-switch" name="to" defaultValue={shop.slug} className="min-w-0 flex-1 rounded-md border border-line bg-bg px-2 py-1 text-sm">
                  {shops.map((s) => <option key={s.slug} value={s.slug}>{s.name}</option>)}
                </select>
                <button type="submit" className="rounded-md border border-line px-2 text-sm hover:border-brass">Go</button>
              </div>
            </form>
          ) : null}
        </div>
        <ShopNav entries={shopNavFor(grants)} />
      </aside>
      <div className="min-w-0">{children}</div>
    </div>
  );
}
