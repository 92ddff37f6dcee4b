// POST /api/v1/orders/[id]/ship — the shop marks a paid order shipped, with tracking text; the buyer gets an e-mail
import { getShopQuoteOrThrow } from "@/db/queries/orders";
import { markShipped } from "@/db/queries/orders-write";
import { withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { orderMail } from "@/lib/payments/mail";
import { shipOrderSchema } from "@/lib/validation/orders";

export const dynamic = "force-dynamic";

export const POST = withSession<{ id: string }>(async (request, { user, params }) => {
  const found = await getShopQuoteOrThrow({ id: params.id, userId: user.id, permission: { order: "ship" } });
  const { tracking } = await parseJsonBody(request, shipOrderSchema, 10_000);
  const quote = await markShipped({ id: found.quote.id, tracking });
  await orderMail.shipped(quote, found.buyer.email, found.shop.name);
  return Response.json({ id: quote.id, status: quote.status, tracking: quote.tracking });
});
