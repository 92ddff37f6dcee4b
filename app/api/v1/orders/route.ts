// GET /api/v1/orders?shop=<slug> — a shop's quotes and orders, for its members; without ?shop, the buyer's own
import { getMemberShopOrThrow, listBuyerQuotes, listShopQuotes } from "@/db/queries/orders";
import { withSession } from "@/lib/auth/session";
import { parseWith } from "@/lib/http/body";
import { displayStatus } from "@/lib/payments/status";
import { listShopOrdersSchema } from "@/lib/validation/orders";

export const dynamic = "force-dynamic";

export const GET = withSession(async (request, { user }) => {
  const params = new URL(request.url).searchParams;
  if (!params.has("shop")) {
    const items = await listBuyerQuotes({ buyerId: user.id });
    return Response.json({ items: items.map((q) => ({ ...q, statusLabel: displayStatus(q) })) });
  }
  const { shop: slug } = parseWith(listShopOrdersSchema, Object.fromEntries(params));
  const shop = await getMemberShopOrThrow({ slug, userId: user.id });
  const items = await listShopQuotes({ organizationId: shop.id });
  return Response.json({ shop: { name: shop.name, slug: shop.slug, role: shop.role }, items: items.map((q) => ({ ...q, statusLabel: displayStatus(q) })) });
});
