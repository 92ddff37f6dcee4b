// GET/POST /api/v1/shops/[slug]/members — the shop's people (members), and the owner inviting staff by e-mail
import { listMembers, listPendingInvitations } from "@/db/queries/shops";
import { withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { requireShopMember } from "@/lib/shops/access";
import { inviteStaff } from "@/lib/shops/members";
import { inviteStaffSchema } from "@/lib/validation/shops";

export const dynamic = "force-dynamic";
type P = { slug: string };

export const GET = withSession<P>(async (_request, { user, params }) => {
  const { shop } = await requireShopMember({ slug: params.slug, user, permission: { members: "read" } });
  const [members, invitations] = await Promise.all([listMembers({ organizationId: shop.id }), listPendingInvitations({ organizationId: shop.id })]);
  return Response.json({ members, invitations });
});

export const POST = withSession<P>(async (request, { user, params }) => {
  const { shop } = await requireShopMember({ slug: params.slug, user, permission: { members: "manage" } });
  const { email } = await parseJsonBody(request, inviteStaffSchema, 10_000);
  const invitation = await inviteStaff({ shop, email, inviterName: user.name, headers: request.headers });
  return Response.json({ invitation }, { status: 201 });
});
