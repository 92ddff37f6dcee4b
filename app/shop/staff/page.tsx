import { PageTitle } from "@/components/ui/card";
import { StaffPanel } from "@/components/shops/staff-panel";
import { canInShop } from "@/lib/auth/roles";
import { listMembers, listPendingInvitations } from "@/db/queries/shops";
import { dashboardShopOrNull } from "@/lib/shops/dashboard";

export const metadata = { title: "Staff" };

export default async function StaffPage() {
  const ctx = await dashboardShopOrNull("/shop/staff");
  if (!ctx) return null;
  const manages = canInShop(ctx.grants, { members: "manage" });
  const [members, invitations] = await Promise.all([listMembers({ organizationId: ctx.shop.id }), manages ? listPendingInvitations({ organizationId: ctx.shop.id }) : []]);
  const self = members.find((m) => m.userId === ctx.user.id);
  return (
    <>
      <PageTitle title="Staff" lead={`The people who run ${ctx.shop.name} on Trainyard.`} />
      <StaffPanel shopSlug={ctx.shop.slug} members={members} invitations={invitations} isOwner={manages} selfId={self?.id ?? ""} />
    </>
  );
}
