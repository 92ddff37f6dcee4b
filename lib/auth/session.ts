import "server-only";
import { headers } from "next/headers";
import { AppError, toErrorResponse } from "@/lib/errors";
import { assertTrustedOrigin } from "@/lib/http/origin";
import { consumeLimit, type LimitName } from "@/lib/http/rate-limit";
import { isBanned } from "./ban";
import { getAuth } from "./index";
import { can, roleOf, type SitePermission, type SiteRole } from "./roles";

export type SessionUser = { id: string; email: string; name: string; role: SiteRole; emailVerified: boolean };

/**
 * better-auth answers null at once when the request has no session-token cookie (whatever else
 * it carries), but only after building its endpoint context, hooks and a dozen promises: about
 * a tenth of an anonymous cached solve's CPU time. A request without that cookie (under either
 * name, `__Secure-` prefixed or not) skips the call; any request that might carry one asks.
 */
export function mayCarrySession(requestHeaders: Headers): boolean {
  return requestHeaders.get("cookie")?.includes("better-auth.session_token=") ?? false;
}

export async function getSessionUser(requestHeaders?: Headers): Promise<SessionUser | null> {
  const h = requestHeaders ?? (await headers());
  if (!mayCarrySession(h)) return null;
  const session = await getAuth().api.getSession({ headers: h });
  if (!session?.user) return null;
  const u = session.user as typeof session.user & { role?: string | null; banned?: boolean | null; banExpires?: Date | null };
  if (isBanned(u)) return null;
  return { id: u.id, email: u.email, name: u.name, role: roleOf(u.role), emailVerified: u.emailVerified };
}

/** Is the user signed in and allowed this (see lib/auth/roles.ts)? */
export function allowed(user: SessionUser | null, permission: SitePermission): boolean {
  return !!user && can(user.role, permission);
}

/** Throws unless the user is signed in (and, when given, holds `permission`). */
export function requireUser(user: SessionUser | null, permission?: SitePermission): SessionUser {
  if (!user) throw new AppError("unauthorized", "Sign in to do this.");
  if (permission && !can(user.role, permission)) throw new AppError("forbidden", "Your account may not do this.");
  return user;
}

type RouteContext<P> = { params: Promise<P> };
type Handler<P, U> = (request: Request, ctx: { user: U; params: P }) => Promise<Response> | Response;

const WRITE_METHODS = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/**
 * The one wrapper for route handlers: refuses writes from foreign origins (403), resolves the
 * session, checks the role, counts the request against its rate limit (`limit`, or "write" for
 * any write), awaits params, and turns any thrown error into the JSON error shape. Ownership
 * is checked by the handler (through getXOrThrow query helpers), never assumed from the URL.
 */
export function withSession<P = Record<string, string>>(
  handler: Handler<P, SessionUser>, opts?: { permission?: SitePermission; limit?: LimitName; anonymous?: false },
): (request: Request, ctx: RouteContext<P>) => Promise<Response>;
export function withSession<P = Record<string, string>>(
  handler: Handler<P, SessionUser | null>, opts: { anonymous: true; limit?: LimitName },
): (request: Request, ctx: RouteContext<P>) => Promise<Response>;
export function withSession<P>(
  // biome-ignore lint/suspicious/noExplicitAny: the implementation signature; the overloads above narrow it
  handler: Handler<P, any>, opts: { permission?: SitePermission; anonymous?: boolean; limit?: LimitName } = {},
) {
  return async (request: Request, ctx: RouteContext<P>) => {
    try {
      assertTrustedOrigin(request);
      const user = await getSessionUser(request.headers);
      const limit = opts.limit ?? (WRITE_METHODS.has(request.method.toUpperCase()) ? "write" : null);
      if (limit) await consumeLimit(request, limit, user?.id ?? null);
      if (!opts.anonymous) requireUser(user, opts.permission);
      const params = (await ctx?.params) ?? ({} as P);
      return await handler(request, { user, params });
    } catch (err) {
      return toErrorResponse(err);
    }
  };
}
