import "server-only";
import { getMemberOrThrow } from "@/db/queries/shops";
import { getAuth } from "@/lib/auth";
import { siteOrigin } from "@/lib/builds/site-url";
import { AppError } from "@/lib/errors";
import { linkMail, sendMail } from "@/lib/mail";
import type { Shop } from "@/db/queries/shops";

/** better-auth's organization endpoints speak APIError; the app speaks AppError. */
async function viaAuth<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (err) {
    // Duck-typed: the bundled server may hold more than one copy of better-auth's APIError class.
    const api = err as { name?: string; statusCode?: number; body?: { message?: string }; message?: string };
    if (api && typeof api === "object" && api.name === "APIError" && typeof api.statusCode === "number") {
      const status = api.statusCode;
      const message = api.body?.message ?? api.message ?? "The shop could not do that";
      const nice = message.charAt(0).toUpperCase() + message.slice(1).toLowerCase();
      throw new AppError(status === 403 ? "forbidden:shop" : status === 401 ? "unauthorized" : status === 404 ? "not_found:invitation" : "bad_request:shop", nice.endsWith(".") ? nice : `${nice}.`);
    }
    throw err;
  }
}

/** The owner invites a staff member: a better-auth invitation, and a mail through the outbox. */
export async function inviteStaff({ shop, email, inviterName, headers }: { shop: Shop; email: string; inviterName: string; headers: Headers }) {
  const invitation = await viaAuth(() => getAuth().api.createInvitation({ headers, body: { email, role: "staff", organizationId: shop.id } }));
  const url = `${siteOrigin(headers)}/shops/join/${invitation.id}`;
  await sendMail({
    to: email, subject: `Join ${shop.name} on Trainyard`,
    ...linkMail(`${inviterName} invited you to help run ${shop.name} on Trainyard: its stock, its answers and its quotes. Sign in (or create an account) with this address, then accept.`, url, "See the invitation", "The invitation lasts 48 hours. If you did not expect it, ignore this message."),
  });
  return { id: invitation.id, email: invitation.email, expiresAt: invitation.expiresAt };
}

export async function acceptInvitation({ invitationId, headers }: { invitationId: string; headers: Headers }) {
  return viaAuth(() => getAuth().api.acceptInvitation({ headers, body: { invitationId } }));
}

/** Only the owner removes people, and no one removes the owner (not even the owner, here). */
export async function removeStaff({ shop, memberId, headers }: { shop: Shop; memberId: string; headers: Headers }) {
  const target = await getMemberOrThrow({ organizationId: shop.id, memberId });
  if (target.role === "owner") throw new AppError("forbidden:shop_owner", "The owner of a shop cannot be removed.");
  await viaAuth(() => getAuth().api.removeMember({ headers, body: { memberIdOrEmail: memberId, organizationId: shop.id } }));
  return { removed: target.email };
}
