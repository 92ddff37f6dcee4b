// POST /api/v1/quotes/[id]/checkout — the buyer accepts: stock is reserved and a payment page opens
// DELETE — the buyer ends an open payment; the reservation is released
import { withSession } from "@/lib/auth/session";
import { siteOrigin } from "@/lib/builds/site-url";
import { endCheckout, startCheckout } from "@/lib/payments/checkout";

export const dynamic = "force-dynamic";

export const POST = withSession<{ id: string }>(async (request, { user, params }) => {
  const { url, sessionId } = await startCheckout({ quoteId: params.id, userId: user.id, origin: siteOrigin(request.headers) });
  return Response.json({ url, sessionId }, { status: 201 });
});

export const DELETE = withSession<{ id: string }>(async (_request, { user, params }) => {
  const { outcome } = await endCheckout({ quoteId: params.id, userId: user.id });
  return Response.json({ outcome });
});
