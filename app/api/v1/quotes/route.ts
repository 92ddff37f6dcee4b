// POST /api/v1/quotes — a buyer asks a shop for a quote on a build; GET — the buyer's own quotes and orders
import { listBuyerQuotes } from "@/db/queries/orders";
import { withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { createQuoteRequest } from "@/lib/payments/quote-request";
import { displayStatus } from "@/lib/payments/status";
import { createQuoteSchema } from "@/lib/validation/orders";

export const dynamic = "force-dynamic";

export const POST = withSession(async (request, { user }) => {
  const input = await parseJsonBody(request, createQuoteSchema, 20_000);
  const quote = await createQuoteRequest({ input, user });
  return Response.json({ id: quote.id, ref: quote.ref, status: quote.status, url: `/quotes/${quote.id}` }, { status: 201 });
});

export const GET = withSession(async (_request, { user }) => {
  const items = await listBuyerQuotes({ buyerId: user.id });
  return Response.json({ items: items.map((q) => ({ ...q, statusLabel: displayStatus(q) })) });
});
