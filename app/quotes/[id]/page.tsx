import Link from "next/link";
import { notFound, redirect } from "next/navigation";
import { BuyerActions } from "@/components/orders/buyer-actions";
import { OrderLines, TrainLine } from "@/components/orders/order-lines";
import { StatusBadge, StatusSteps } from "@/components/orders/status-badge";
import { FormMessage } from "@/components/ui/field";
import { getQuoteForViewerOrThrow } from "@/db/queries/orders";
import { getSessionUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { reconcileCheckout } from "@/lib/payments/checkout";
import { formatMoney } from "@/lib/payments/money";
import { canCancel, canPay, isExpired } from "@/lib/payments/status";
import { quoteToJson } from "@/lib/payments/to-json";
import { formatDay } from "@/lib/format";

export const metadata = { title: "Quote", robots: { index: false } };

type Props = { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

async function load(id: string, userId: string) {
  try {
    return await getQuoteForViewerOrThrow({ id, userId });
  } catch (err) {
    if (err instanceof AppError && err.status === 404) return null;
    throw err;
  }
}

export default async function QuotePage({ params, searchParams }: Props) {
  const { id } = await params;
  const search = await searchParams;
  const user = await getSessionUser();
  if (!user) redirect(`/sign-in?next=/quotes/${encodeURIComponent(id)}`);
  let found = await load(id, user.id);
  if (!found) notFound();
  if (!found.isBuyer) redirect(`/shop/orders/${id}`);
  // Back from the payment page, or a payment left open: read the session so the page is never stale.
  if (await reconcileCheckout(found.quote)) found = (await load(id, user.id))!;
  const q = quoteToJson(found);
  const money = (n: number) => formatMoney(n, q.currency);

  return (
    <article className="max-w-4xl space-y-6">
      <nav className="text-sm text-muted"><Link href="/account/orders" className="underline-offset-4 hover:underline">Your orders</Link> / {q.ref}</nav>
      {search.sent ? <FormMessage tone="ok">Sent to {q.shop.name}. You will get an e-mail when the shop answers.</FormMessage> : null}
      {search.paid && q.status === "paid" ? <FormMessage tone="ok">Paid. {q.shop.name} has your parts set aside and will ship them.</FormMessage> : null}
      {search.paid && q.status === "awaiting_payment" ? <FormMessage tone="info">The payment is being confirmed; this page shows it as soon as the shop&rsquo;s payment provider tells us.</FormMessage> : null}
      {search.checkout === "cancelled" && q.status !== "paid" ? <FormMessage tone="info">You left the payment page without paying.</FormMessage> : null}

      <header className="flex flex-wrap items-end justify-between gap-4">
        <div className="space-y-2">
          <div className="flex flex-wrap items-center gap-2"><StatusBadge status={q.status} expiresAt={q.expiresAt} /><span className="code text-sm text-muted">{q.ref}</span></div>
          <h1 className="text-2xl font-semibold tracking-tight text-ink sm:text-3xl">Parts for “{q.build.title}”</h1>
          <p className="text-sm text-muted">From <strong className="font-semibold text-text">{q.shop.name}</strong> · asked {formatDay(q.createdAt)}{q.quotedAt ? <> · quoted {formatDay(q.quotedAt)}</> : null}{q.paidAt ? <> · paid {formatDay(q.paidAt)}</> : null}</p>
        </div>
        <div className="text-right">
          <div className="text-xs uppercase tracking-wide text-muted">{q.status === "requested" ? "Listed prices" : "Total"}</div>
          <div className="num text-3xl font-semibold text-ink">{money(q.totalCents)}</div>
          {q.expiresAt && (q.status === "quoted" || q.status === "awaiting_payment") ? <div className={`text-xs ${q.expired ? "text-bad" : "text-muted"}`}>{q.expired ? "expired" : "valid until"} {formatDay(q.expiresAt)}</div> : null}
        </div>
      </header>

      <StatusSteps status={q.status} />

      <section aria-labelledby="train-h" className="space-y-2 rounded-lg border border-line bg-surface p-4">
        <h2 id="train-h" className="text-sm font-semibold text-ink">The train, sky to sensor</h2>
        <TrainLine quote={q} />
        <p className="text-xs text-muted">Brass boxes are the connecting parts; <Link href={`/b/${q.build.slug}`} className="underline underline-offset-4">the saved build</Link> has the drawing and the back focus.</p>
      </section>

      <section aria-labelledby="lines-h" className="space-y-3">
        <h2 id="lines-h" className="text-lg font-semibold text-ink">{q.status === "requested" ? "What you asked for" : q.paidAt ? "Your order" : "What the shop quotes"}</h2>
        <OrderLines quote={q} />
        {q.missing.length ? <p className="text-sm text-muted">Not stocked by {q.shop.name}: {q.missing.map((m) => `${m.count} × ${m.name}`).join(", ")}.</p> : null}
      </section>

      <div className="grid gap-4 sm:grid-cols-2">
        {q.buyerNote ? <Note title="Your note" text={q.buyerNote} /> : null}
        {q.shopNote ? <Note title={`${q.shop.name} says`} text={q.shopNote} /> : null}
        {q.tracking ? <Note title={`Shipped ${formatDay(q.shippedAt)}`} text={q.tracking} /> : null}
        {q.status === "refunded" ? <Note title={`Refunded ${formatDay(q.refundedAt)}`} text={`${money(q.totalCents)} goes back to the card you paid with.`} /> : null}
        {q.status === "cancelled" ? <Note title={`Cancelled ${formatDay(q.cancelledAt)}`} text={q.cancelReason ?? "No reason given."} /> : null}
      </div>

      {q.status === "requested" ? <p className="text-sm text-muted">Waiting for {q.shop.name} to answer with its prices and shipping.</p> : null}
      {q.expired ? <FormMessage>This quote expired on {formatDay(q.expiresAt)}. Ask {q.shop.name} for a fresh one.</FormMessage> : null}
      <BuyerActions id={q.id} canPay={canPay(found.quote) && !isExpired(found.quote)} paymentOpen={q.paymentOpen} canCancel={canCancel(q.status)} total={money(q.totalCents)} />
    </article>
  );
}

function Note({ title, text }: { title: string; text: string }) {
  return <div className="rounded-lg border border-line bg-surface px-4 py-3"><h3 className="text-xs font-semibold uppercase tracking-wide text-muted">{title}</h3><p className="mt-1 whitespace-pre-line break-words text-sm text-text">{text}</p></div>;
}
