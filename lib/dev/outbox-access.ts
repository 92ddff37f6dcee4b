import "server-only";
// Who may read the local outbox. It holds password-reset and verification links, so showing
// it to anyone who asks hands over every account (issue 16): it exists only while mail goes
// to the local fake, and then only for an admin — or for anyone under `npm run dev`, which
// listens on 127.0.0.1 alone.
import { can } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session";
import { isMailFake } from "@/lib/mail";

export function mayReadOutbox(viewer: SessionUser | null): boolean {
  if (!isMailFake()) return false;
  // Reading other people's mail is an admin's power, as listing users is.
  return process.env.NODE_ENV === "development" || (!!viewer && can(viewer.role, { user: "list" }));
}
