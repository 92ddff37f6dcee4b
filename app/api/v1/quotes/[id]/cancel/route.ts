// POST /api/v1/quotes/[id]/cancel — the buyer withdraws a request or quote, or the shop declines it
import { getQuoteForViewerOrThrow, listShopMemberEmails } from "@/db/queries/orders";
import { cancelQuote } from "@/db/queries/orders-write";
import { canInShop } from "@/lib/auth/roles";
import { withSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { parseJsonBody } from "@/lib/http/body";
import { orderMail } from "@/lib/payments/mail";
import { cancelQuoteSchema } from "@/lib/validation/orders";

export const dynamic = "force-dynamic";

export const POST = withSession<{ id: string }>(async (request, { user, params }) => {
  const found = await getQuoteForViewerOrThrow({ id: params.id, userId: user.id });
  // The buyer may always withdraw; on the shop's side, declining is part of answering.
  if (!found.isBuyer && !canInShop(found.shopRole, { quote: "answer" })) throw new AppError("forbidden:shop_role", "Your role at this shop does not allow declining quotes.");
  const { reason } = await parseJsonBody(request, cancelQuoteSchema, 10_000);
  const quote = await cancelQuote({ id: found.quote.id, reason: reason || null });
  if (found.isBuyer) await orderMail.cancelled(quote, await listShopMemberEmails({ organizationId: quote.organizationId }), found.buyer.name);
  else await orderMail.cancelled(quote, found.buyer.email, found.shop.name);
  return Response.json({ id: quote.id, status: quote.status });
});
