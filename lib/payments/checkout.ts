import "server-only";
import type Stripe from "stripe";
import { getBuyerQuoteOrThrow, getQuoteById, getShopQuoteOrThrow, listShopMemberEmails } from "@/db/queries/orders";
import { applySessionState, attachCheckoutSession, releasePendingReservation, reserveForCheckout, type SessionFacts } from "@/db/queries/orders-stock";
import { claimRefund, finishRefund } from "@/db/queries/orders-write";
import { AppError } from "@/lib/errors";
import { orderMail } from "./mail";
import { CHECKOUT_MINUTES, getStripe } from "./stripe";

export function sessionFacts(s: Stripe.Checkout.Session): SessionFacts {
  return {
    sessionId: s.id, status: s.status ?? "open", paymentStatus: s.payment_status,
    paymentIntentId: typeof s.payment_intent === "string" ? s.payment_intent : s.payment_intent?.id ?? null,
    amountTotal: s.amount_total ?? null, currency: s.currency ?? null,
  };
}

/**
 * Accepting a quote: reserve the stock (one transaction, row locks), then open a Checkout
 * Session for exactly the quote's server-side amounts. If the provider fails, the stock goes back.
 */
export async function startCheckout({ quoteId, userId, origin }: { quoteId: string; userId: string; origin: string }): Promise<{ url: string; sessionId: string | null }> {
  const found = await getBuyerQuoteOrThrow({ id: quoteId, userId });
  const reservation = await reserveForCheckout({ quoteId, buyerId: userId });
  if (reservation.kind === "open") return { url: reservation.url, sessionId: found.quote.checkoutSessionId };
  const q = reservation.quote;
  const currency = q.currency.toLowerCase();
  const lineItems: Stripe.Checkout.SessionCreateParams.LineItem[] = reservation.lines.map((l) => ({
    quantity: l.quantity, price_data: { currency, unit_amount: l.unitPriceCents, product_data: { name: `${l.name} (${l.sku})` } },
  }));
  if (q.shippingCents > 0) lineItems.push({ quantity: 1, price_data: { currency, unit_amount: q.shippingCents, product_data: { name: "Shipping" } } });
  try {
    const session = await getStripe().checkout.sessions.create({
      mode: "payment",
      line_items: lineItems,
      client_reference_id: q.id,
      customer_email: found.buyer.email,
      metadata: { quoteId: q.id, quoteRef: q.ref },
      success_url: `${origin}/quotes/${q.id}?paid={CHECKOUT_SESSION_ID}`,
      cancel_url: `${origin}/quotes/${q.id}?checkout=cancelled`,
      expires_at: Math.floor(Date.now() / 1000) + CHECKOUT_MINUTES * 60 + 30,
    }, { idempotencyKey: `checkout:${q.id}:${q.updatedAt.getTime()}` });
    if (!session.url) throw new Error("the provider returned no payment page");
    await attachCheckoutSession({ quoteId: q.id, sessionId: session.id, url: session.url });
    return { url: session.url, sessionId: session.id };
  } catch (err) {
    await releasePendingReservation({ quoteId: q.id });
    console.error(`[payments] checkout for ${q.ref} failed: ${(err as Error).message}`);
    throw new AppError("unavailable:payments", "The payment page could not be opened; nothing was reserved or charged. Please try again.");
  }
}

/** The buyer gives up a payment: the provider ends the session, and its expiry event (or this answer) releases the stock. */
export async function endCheckout({ quoteId, userId }: { quoteId: string; userId: string }) {
  const { quote } = await getBuyerQuoteOrThrow({ id: quoteId, userId });
  if (quote.status !== "awaiting_payment" || !quote.checkoutSessionId) throw new AppError("conflict:quote", "No payment is open for this quote.");
  let session: Stripe.Checkout.Session;
  try {
    session = await getStripe().checkout.sessions.expire(quote.checkoutSessionId);
  } catch {
    session = await getStripe().checkout.sessions.retrieve(quote.checkoutSessionId);
  }
  return settleFromProvider(session);
}

/** Applies a session read back from the provider; a payment it settles is announced once. */
async function settleFromProvider(session: Stripe.Checkout.Session) {
  const result = await applySessionState(sessionFacts(session));
  if (result.outcome === "paid" && result.quoteId) await announcePaid(result.quoteId);
  return result;
}

/** Reads an open session back from the provider, so a late webhook never leaves a page stale. */
export async function reconcileCheckout(quote: { status: string; checkoutSessionId: string | null }) {
  if (quote.status !== "awaiting_payment" || !quote.checkoutSessionId) return null;
  try {
    const session = await getStripe().checkout.sessions.retrieve(quote.checkoutSessionId);
    return session.status === "open" ? null : await settleFromProvider(session);
  } catch (err) {
    console.error(`[payments] could not read session ${quote.checkoutSessionId}: ${(err as Error).message}`);
    return null;
  }
}

/** The shop refunds the whole order through the provider; the order says refunded only once the provider agrees. */
export async function refundOrder({ quoteId, userId }: { quoteId: string; userId: string }) {
  const found = await getShopQuoteOrThrow({ id: quoteId, userId, permission: { order: "refund" } });
  const { quote } = await claimRefund({ id: quoteId });
  let refundId: string | null = null;
  try {
    const refund = await getStripe().refunds.create({ payment_intent: quote.paymentIntentId!, metadata: { quoteId: quote.id } }, { idempotencyKey: `refund:${quote.id}` });
    refundId = refund.id;
  } catch (err) {
    console.error(`[payments] refund of ${quote.ref} failed: ${(err as Error).message}`);
  }
  await finishRefund({ id: quote.id, refundId });
  if (!refundId) throw new AppError("unavailable:payments", "The refund did not go through; nothing changed. Please try again.");
  const refunded = { ...quote, status: "refunded" as const, refundId, refundedAt: new Date() };
  await orderMail.refunded(refunded, found.buyer.email, found.shop.name);
  return refunded;
}

/** After a payment settles (webhook or read-back): the buyer and the shop hear of it once. */
export async function announcePaid(quoteId: string) {
  const found = await getQuoteById({ id: quoteId });
  if (!found) return;
  await orderMail.paid(found.quote, found.buyer.email, await listShopMemberEmails({ organizationId: found.quote.organizationId }), found.shop.name);
}
