// GET /api/v1/quotes/[id] — one quote or order, for its buyer or its shop's members (404 for anyone else)
import { getQuoteForViewerOrThrow } from "@/db/queries/orders";
import { withSession } from "@/lib/auth/session";
import { quoteToJson } from "@/lib/payments/to-json";

export const dynamic = "force-dynamic";

export const GET = withSession<{ id: string }>(async (_request, { user, params }) => {
  return Response.json(quoteToJson(await getQuoteForViewerOrThrow({ id: params.id, userId: user.id })));
});
