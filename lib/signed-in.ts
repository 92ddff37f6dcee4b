import "server-only";
// The signed-in user for a page, read once per request however many layouts and pages ask.
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { cache } from "react";
import { getSessionUser, type SessionUser } from "@/lib/auth/session";
import { PAGE_PATH_HEADER, returnPath } from "@/lib/page-path";

export const requestUser = cache((): Promise<SessionUser | null> => getSessionUser());

/**
 * The user, or a redirect to sign in and back. Call it from the layout above a loading.tsx: a
 * redirect from inside the streamed page would answer 200 and a client-side refresh instead of
 * 307 (proxy.ts already sends visitors without a session cookie). `section` is where to come
 * back to; a layout serves several pages, so the page's own path (set by proxy.ts) is used
 * instead when it lies inside the section.
 */
export async function requireUser(section: string): Promise<SessionUser> {
  const user = await requestUser();
  if (!user) {
    const next = returnPath(section, (await headers()).get(PAGE_PATH_HEADER));
    redirect(`/sign-in?next=${encodeURIComponent(next)}`);
  }
  return user;
}
