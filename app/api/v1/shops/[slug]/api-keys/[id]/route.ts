// DELETE /api/v1/shops/[slug]/api-keys/[id] — the owner revokes a key; it stops working at once
import { revokeApiKey } from "@/db/queries/shops-keys";
import { withSession } from "@/lib/auth/session";
import { requireShopMember } from "@/lib/shops/access";

export const dynamic = "force-dynamic";

export const DELETE = withSession<{ slug: string; id: string }>(async (_request, { user, params }) => {
  const { shop } = await requireShopMember({ slug: params.slug, user, permission: { apiKey: "manage" } });
  await revokeApiKey({ organizationId: shop.id, id: params.id });
  return Response.json({ revoked: params.id });
});
