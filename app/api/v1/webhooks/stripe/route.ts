// POST /api/v1/webhooks/stripe — payment events, verified with the SDK and the webhook secret.
// A bad or missing signature gets 400 and changes nothing; each event id is acted on once.
import type Stripe from "stripe";
import { applyPaymentEvent } from "@/db/queries/orders-stock";
import { AppError, toErrorResponse } from "@/lib/errors";
import { announcePaid, sessionFacts } from "@/lib/payments/checkout";
import { getStripe, webhookSecret } from "@/lib/payments/stripe";

export const dynamic = "force-dynamic";

const SESSION_EVENTS = new Set(["checkout.session.completed", "checkout.session.expired", "checkout.session.async_payment_succeeded", "checkout.session.async_payment_failed"]);

export async function POST(request: Request) {
  try {
    const signature = request.headers.get("stripe-signature");
    const body = await request.text();
    if (body.length > 1_000_000) throw new AppError("payload_too_large", "The event is too large.");
    if (!signature) throw new AppError("bad_request:signature", "The Stripe-Signature header is missing.");
    let event: Stripe.Event;
    try {
      event = getStripe().webhooks.constructEvent(body, signature, webhookSecret());
    } catch (err) {
      if (err instanceof AppError) throw err;
      throw new AppError("bad_request:signature", "The event's signature does not verify.");
    }
    const session = SESSION_EVENTS.has(event.type) ? sessionFacts(event.data.object as Stripe.Checkout.Session) : null;
    const result = await applyPaymentEvent({ eventId: event.id, type: event.type, session });
    if (result.outcome === "paid" && result.quoteId) await announcePaid(result.quoteId);
    return Response.json({ received: true, duplicate: result.duplicate, outcome: result.outcome });
  } catch (err) {
    return toErrorResponse(err);
  }
}
