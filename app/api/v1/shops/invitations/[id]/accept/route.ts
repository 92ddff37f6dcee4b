// POST /api/v1/shops/invitations/[id]/accept — the invited person (signed in with that address) joins the shop
import { withSession } from "@/lib/auth/session";
import { acceptInvitation } from "@/lib/shops/members";

export const dynamic = "force-dynamic";

export const POST = withSession<{ id: string }>(async (request, { params }) => {
  const result = await acceptInvitation({ invitationId: params.id, headers: request.headers });
  return Response.json({ organizationId: result?.invitation?.organizationId ?? null });
});
