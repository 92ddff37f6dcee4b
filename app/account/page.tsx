import Link from "next/link";
import { Suspense } from "react";
import { SignOutButton } from "@/components/account/sign-out-button";
import { OrdersCard } from "@/components/orders/orders-card";
import { listMemberShops } from "@/db/queries/orders";
import { Card, PageTitle } from "@/components/ui/card";
import { requireUser } from "@/lib/signed-in";
import { YourShops } from "@/components/shops/your-shops";

export const metadata = { title: "Account" };

const ROLE_WORDS = {
  member: "You can plan, save builds, keep a gear list and submit missing parts.",
  moderator: "You can also review submitted parts, endorse reference builds and hide builds.",
  admin: "You can do everything a moderator can, and manage accounts.",
} as const;

/** The orders card, with the shop's orders when this person works for a shop. */
async function OrdersCardFor({ userId }: { userId: string }) {
  return <OrdersCard shopMember={(await listMemberShops({ userId })).length > 0} />;
}

export default async function AccountPage() {
  const user = await requireUser("/account");
  return (
    <div className="max-w-3xl">
      <PageTitle title="Your account" lead={`${user.name} · ${user.email}`}><SignOutButton /></PageTitle>
      <div className="grid gap-4 sm:grid-cols-2">
        <Card>
          <h2 className="font-medium text-ink">Role: <span className="capitalize">{user.role}</span></h2>
          <p className="mt-1 text-sm text-muted">{ROLE_WORDS[user.role]}</p>
        </Card>
        <Suspense fallback={null}><YourShops userId={user.id} /></Suspense>
        <Card>
          <h2 className="font-medium text-ink">Your gear</h2>
          <p className="mt-1 text-sm text-muted">Mark the parts you own; the planner counts them as free and lists only what is still to buy.</p>
          <Link href="/account/gear" className="mt-3 inline-block text-sm underline decoration-brass underline-offset-4">Edit my gear</Link>
        </Card>
        <Card>
          <h2 className="font-medium text-ink">Your builds</h2>
          <p className="mt-1 text-sm text-muted">Trains you saved as links.</p>
          <Link href="/builds?mine=1" className="mt-3 inline-block text-sm underline decoration-brass underline-offset-4">See my builds</Link>
        </Card>
        <Suspense fallback={<OrdersCard shopMember={false} />}><OrdersCardFor userId={user.id} /></Suspense>
        <Card>
          <h2 className="font-medium text-ink">Submit a missing part</h2>
          <p className="mt-1 text-sm text-muted">Send its numbers and a spec sheet; a moderator checks it before it joins the catalog.</p>
          <div className="mt-3 flex flex-wrap gap-x-4 text-sm">
            <Link href="/parts/submit" className="underline decoration-brass underline-offset-4">Submit a part</Link>
            <Link href="/account/submissions" className="underline decoration-brass underline-offset-4">My submissions</Link>
          </div>
        </Card>
      </div>
    </div>
  );
}
