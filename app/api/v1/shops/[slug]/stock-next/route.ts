// GET /api/v1/shops/[slug]/stock-next — parts that would have answered the most recent unanswered solves
import { withSession } from "@/lib/auth/session";
import { requireShopMember } from "@/lib/shops/access";
import { stockNextForShop } from "@/lib/shops/stock-next-query";

export const dynamic = "force-dynamic";

export const GET = withSession<{ slug: string }>(async (_request, { user, params }) => {
  const { shop } = await requireShopMember({ slug: params.slug, user, permission: { inventory: "read" } });
  return Response.json(await stockNextForShop({ organizationId: shop.id }));
});
