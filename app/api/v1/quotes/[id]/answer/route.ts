// POST /api/v1/quotes/[id]/answer — the shop sends (or revises) its quote; the buyer gets an e-mail
import { getShopQuoteOrThrow } from "@/db/queries/orders";
import { answerQuote } from "@/db/queries/orders-write";
import { withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { orderMail } from "@/lib/payments/mail";
import { quoteToJson } from "@/lib/payments/to-json";
import { answerQuoteSchema } from "@/lib/validation/orders";

export const dynamic = "force-dynamic";

export const POST = withSession<{ id: string }>(async (request, { user, params }) => {
  const found = await getShopQuoteOrThrow({ id: params.id, userId: user.id, permission: { quote: "answer" } });
  const input = await parseJsonBody(request, answerQuoteSchema, 100_000);
  const quote = await answerQuote({ id: found.quote.id, input });
  await orderMail.quoted(quote, found.buyer.email, found.shop.name);
  return Response.json(quoteToJson(await getShopQuoteOrThrow({ id: quote.id, userId: user.id, permission: { quote: "answer" } })));
});
