// DELETE /api/v1/shops/[slug]/members/[memberId] — the owner removes a staff member (never the owner)
import { withSession } from "@/lib/auth/session";
import { requireShopMember } from "@/lib/shops/access";
import { removeStaff } from "@/lib/shops/members";

export const dynamic = "force-dynamic";

export const DELETE = withSession<{ slug: string; memberId: string }>(async (request, { user, params }) => {
  const { shop } = await requireShopMember({ slug: params.slug, user, permission: { members: "manage" } });
  return Response.json(await removeStaff({ shop, memberId: params.memberId, headers: request.headers }));
});
