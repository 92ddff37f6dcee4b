import "server-only";
// The signed-in user for a page, read once per request however many layouts and pages ask.
import { redirect } from "next/navigation";
import { cache } from "react";
import { getSessionUser, type SessionUser } from "@/lib/auth/session";

export const requestUser = cache((): Promise<SessionUser | null> => getSessionUser());

/**
 * The user, or a redirect to sign in and back to `next`. Call it from the layout above a
 * loading.tsx: a redirect from inside the streamed page would answer 200 and a client-side
 * refresh instead of 307 (proxy.ts already sends visitors without a session cookie).
 */
export async function requireUser(next: string): Promise<SessionUser> {
  const user = await requestUser();
  if (!user) redirect(`/sign-in?next=${next}`);
  return user;
}
