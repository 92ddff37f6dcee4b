import Link from "next/link";
import { Fragment } from "react";
import { notFound, redirect } from "next/navigation";
import { OrderLines, TrainLine } from "@/components/orders/order-lines";
import { QuoteEditor } from "@/components/orders/quote-editor";
import { ShopOrderActions } from "@/components/orders/shop-order-actions";
import { StatusBadge, StatusSteps } from "@/components/orders/status-badge";
import { getQuoteForViewerOrThrow } from "@/db/queries/orders";
import { getSessionUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { reconcileCheckout } from "@/lib/payments/checkout";
import { formatMoney } from "@/lib/payments/money";
import { canAnswer, canCancel, canRefund, canShip } from "@/lib/payments/status";
import { quoteToJson } from "@/lib/payments/to-json";

export const metadata = { title: "Shop order", robots: { index: false } };

type Props = { params: Promise<{ id: string }> };
const when = (d: Date | string | null) => (d ? `${new Date(d).toLocaleString("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit", timeZone: "UTC" })} UTC` : "—");

async function load(id: string, userId: string) {
  try {
    const found = await getQuoteForViewerOrThrow({ id, userId });
    return found.shopRole ? found : null;
  } catch (err) {
    if (err instanceof AppError && err.status === 404) return null;
    throw err;
  }
}

export default async function ShopOrderPage({ params }: Props) {
  const { id } = await params;
  const user = await getSessionUser();
  if (!user) redirect(`/sign-in?next=/shop/orders/${encodeURIComponent(id)}`);
  let found = await load(id, user.id);
  if (!found) notFound();
  if (await reconcileCheckout(found.quote)) found = (await load(id, user.id))!;
  const q = quoteToJson(found);
  const total = formatMoney(q.totalCents, q.currency);
  const history: [string, Date | string | null][] = [["Requested", q.createdAt], ["Quoted", q.quotedAt], ["Paid", q.paidAt], ["Shipped", q.shippedAt], ["Refunded", q.refundedAt], ["Cancelled", q.cancelledAt]];

  return (
    <article className="space-y-6">
      <nav className="text-sm text-muted"><Link href={`/shop/orders?shop=${q.shop.slug}`} className="underline-offset-4 hover:underline">{q.shop.name} orders</Link> / {q.ref}</nav>
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div className="space-y-2">
          <div className="flex flex-wrap items-center gap-2"><StatusBadge status={q.status} expiresAt={q.expiresAt} /><span className="code text-sm text-muted">{q.ref}</span></div>
          <h1 className="text-2xl font-semibold tracking-tight text-ink sm:text-3xl">{q.buyer.name} · “{q.build.title}”</h1>
          <p className="text-sm text-muted">{q.buyer.email ? <a href={`mailto:${q.buyer.email}`} className="underline underline-offset-4">{q.buyer.email}</a> : null} · <Link href={`/b/${q.build.slug}`} className="underline underline-offset-4">open the build</Link></p>
        </div>
        <div className="text-right"><div className="text-xs uppercase tracking-wide text-muted">{q.status === "requested" ? "At listed prices" : "Total"}</div><div className="num text-3xl font-semibold text-ink">{total}</div></div>
      </header>
      <StatusSteps status={q.status} />

      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <div className="min-w-0 space-y-6">
          <section aria-labelledby="train-h" className="space-y-2 rounded-lg border border-line bg-surface p-4">
            <h2 id="train-h" className="text-sm font-semibold text-ink">The buyer&rsquo;s train, sky to sensor</h2>
            <TrainLine quote={q} />
          </section>
          {q.buyerNote ? <blockquote className="rounded-lg border-l-4 border-brass bg-surface px-4 py-3 text-sm"><span className="block text-xs font-semibold uppercase tracking-wide text-muted">The buyer&rsquo;s note</span><span className="whitespace-pre-line">{q.buyerNote}</span></blockquote> : null}
          {q.missing.length ? <p className="rounded-lg border border-warn/40 bg-warn/5 px-4 py-2 text-sm">Also needed, not in your inventory: {q.missing.map((m) => `${m.count} × ${m.name}`).join(", ")}.</p> : null}
          <section aria-labelledby="quote-h" className="space-y-3">
            <h2 id="quote-h" className="text-lg font-semibold text-ink">{canAnswer(q.status) ? (q.status === "requested" ? "Your quote" : "Revise your quote") : "The order"}</h2>
            {canAnswer(q.status) ? <QuoteEditor quote={q} /> : <OrderLines quote={q} stock />}
            {q.shopNote && !canAnswer(q.status) ? <p className="text-sm text-muted">Your note: {q.shopNote}</p> : null}
            {q.tracking ? <p className="text-sm"><strong>Tracking:</strong> {q.tracking}</p> : null}
          </section>
        </div>
        <aside className="space-y-4">
          <section aria-labelledby="act-h" className="space-y-3 rounded-lg border border-line bg-surface p-4">
            <h2 id="act-h" className="font-semibold text-ink">Next step</h2>
            {q.status === "requested" ? <p className="text-sm text-muted">Check the quantities against your shelf, set prices and shipping, and send. The buyer pays through the link in their e-mail.</p> : null}
            {q.status === "quoted" ? <p className="text-sm text-muted">Sent; waiting for the buyer to pay{q.expiresAt ? ` (valid until ${when(q.expiresAt)})` : ""}.</p> : null}
            {q.status === "awaiting_payment" ? <p className="text-sm text-muted">The buyer is paying now; the parts are held on your shelf until the payment finishes or its page expires.</p> : null}
            {q.status === "cancelled" ? <p className="text-sm text-muted">Cancelled{q.cancelReason ? `: ${q.cancelReason}` : "."}</p> : null}
            {q.status === "refunded" ? <p className="text-sm text-muted">Refunded in full.</p> : null}
            <ShopOrderActions id={q.id} canShip={canShip(q.status)} canRefund={canRefund(q.status)} canDecline={canCancel(q.status)} total={total} />
          </section>
          <section aria-labelledby="hist-h" className="rounded-lg border border-line bg-surface p-4">
            <h2 id="hist-h" className="mb-2 text-sm font-semibold text-ink">History</h2>
            <dl className="grid grid-cols-[6rem_1fr] gap-y-1 text-sm">{history.filter(([, d]) => d).map(([k, d]) => <Fragment key={k}><dt className="text-muted">{k}</dt><dd className="num">{when(d)}</dd></Fragment>)}</dl>
          </section>
        </aside>
      </div>
    </article>
  );
}
