// POST /api/v1/orders/[id]/refund — the shop refunds a paid order in full through the payment provider
import { withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { refundOrder } from "@/lib/payments/checkout";
import { refundOrderSchema } from "@/lib/validation/orders";

export const dynamic = "force-dynamic";

export const POST = withSession<{ id: string }>(async (request, { user, params }) => {
  await parseJsonBody(request, refundOrderSchema, 10_000);
  const quote = await refundOrder({ quoteId: params.id, userId: user.id });
  return Response.json({ id: quote.id, status: quote.status, refundId: quote.refundId });
});
