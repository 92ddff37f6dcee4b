import "server-only";
import { headers } from "next/headers";
import type { z } from "zod";
import { AppError, fieldErrorsOf, toErrorResponse } from "@/lib/errors";
import { readJsonBody, refuseNul } from "@/lib/http/body";
import { assertTrustedOrigin } from "@/lib/http/origin";
import { consumeLimit, type LimitName } from "@/lib/http/rate-limit";
import { getAuth } from "./index";
import { can, roleOf, type SitePermission, type SiteRole } from "./roles";

export type SessionUser = { id: string; email: string; name: string; role: SiteRole; emailVerified: boolean };

export async function getSessionUser(requestHeaders?: Headers): Promise<SessionUser | null> {
  const session = await getAuth().api.getSession({ headers: requestHeaders ?? (await headers()) });
  if (!session?.user) return null;
  const u = session.user as typeof session.user & { role?: string | null; banned?: boolean | null };
  if (u.banned) return null;
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
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- narrowed by the overloads above
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

export { readJsonBody };

/** Parse a JSON body with a zod schema: 415 unless JSON, 413 past `maxBytes`, 400 with field errors when it does not fit. */
export async function parseJsonBody<S extends z.ZodType>(request: Request, schema: S, maxBytes = 1_000_000): Promise<z.output<S>> {
  return parseWith(schema, await readJsonBody(request, maxBytes));
}

export function parseWith<S extends z.ZodType>(schema: S, raw: unknown): z.output<S> {
  refuseNul(raw);
  const parsed = schema.safeParse(raw);
  if (!parsed.success) throw new AppError("bad_request:validation", "Some fields need attention.", fieldErrorsOf(parsed.error.issues));
  return parsed.data;
}

export type ActionState<T = unknown> =
  | { ok: true; data: T; message?: string }
  | { ok: false; message: string; fieldErrors?: Record<string, string[]> }
  | null;

/**
 * The one wrapper for server actions: session + role + zod, and errors as typed form state.
 * Never echoes submitted values (passwords stay out of state).
 */
export function withAction<S extends z.ZodType, T>(
  schema: S,
  action: (input: z.output<S>, user: SessionUser) => Promise<T>,
  opts: { permission?: SitePermission } = {},
) {
  return async (input: unknown): Promise<ActionState<T>> => {
    try {
      const user = requireUser(await getSessionUser(), opts.permission);
      const data = await action(parseWith(schema, input), user);
      return { ok: true, data };
    } catch (err) {
      if (err instanceof AppError) return { ok: false, message: err.message, fieldErrors: err.fields };
      console.error(err);
      return { ok: false, message: "Something went wrong on our side. Please try again." };
    }
  };
}
