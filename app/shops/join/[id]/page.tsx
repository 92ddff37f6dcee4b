import Link from "next/link";
import { PageTitle } from "@/components/ui/card";
import { AcceptInvitation } from "@/components/shops/accept-invitation";
import { getInvitation } from "@/db/queries/shops";
import { getSessionUser } from "@/lib/auth/session";

export const metadata = { title: "Shop invitation" };

export default async function JoinPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const [inv, user] = await Promise.all([getInvitation({ id }), getSessionUser()]);
  const live = inv && inv.status === "pending" && inv.expiresAt > new Date();
  return (
    <div className="max-w-xl">
      <PageTitle title={inv ? `Join ${inv.shopName}` : "Invitation not found"} />
      <div className="rounded-lg border border-line bg-surface p-5 text-sm">
        {!inv || !live ? <p className="text-text">This invitation is unknown, used or expired. Ask the shop&apos;s owner for a new one.</p>
          : !user ? <p className="text-text">The invitation is for <b>{inv.email}</b>. <Link href={`/sign-in?next=/shops/join/${id}`} className="underline decoration-brass underline-offset-4">Sign in</Link> or <Link href={`/sign-up?next=/shops/join/${id}`} className="underline decoration-brass underline-offset-4">create an account</Link> with that address, then come back here.</p>
            : user.email.toLowerCase() !== inv.email.toLowerCase() ? <p className="text-text">The invitation is for <b>{inv.email}</b>, but you are signed in as {user.email}. Sign in with the invited address to accept it.</p>
              : <AcceptInvitation id={id} shopName={inv.shopName} />}
      </div>
    </div>
  );
}
