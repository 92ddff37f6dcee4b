import "server-only";
import { betterAuth } from "better-auth";
import { APIError, createAuthMiddleware } from "better-auth/api";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { admin, organization } from "better-auth/plugins";
import { getDb } from "@/db/client";
import * as schema from "@/db/schema";
import { configuredSiteUrl, trustedOrigins } from "@/lib/http/origin";
import { linkMail, sendMail } from "@/lib/mail";
import { isBanned } from "./ban";
import { shopAc, shopRoles, siteAc, siteRoles } from "./roles";

// A ban set by an admin through better-auth revokes the user's sessions at once; a ban set any
// other way (a database update, a ban that a job applies) must not leave a live session behind.
// get-session answers null for a banned user (and deletes their sessions); every other auth
// endpoint called with a banned user's session cookie is refused.
const sessionOfBanned = createAuthMiddleware(async (ctx) => {
  if (ctx.path === "/get-session") return;
  const token = await ctx.getSignedCookie(ctx.context.authCookies.sessionToken.name, ctx.context.secret);
  if (!token) return;
  const found = await ctx.context.internalAdapter.findSession(token);
  if (!found || !isBanned(found.user as { banned?: boolean | null; banExpires?: Date | null })) return;
  await ctx.context.internalAdapter.deleteUserSessions(found.user.id);
  if (ctx.path === "/sign-out") return; // let it clear the cookie
  throw new APIError("UNAUTHORIZED", { message: "This account is banned; its sessions have ended.", code: "BANNED_USER" });
});
const dropBannedSession = createAuthMiddleware(async (ctx) => {
  if (ctx.path !== "/get-session") return;
  const returned = ctx.context.returned as { user?: { id: string; banned?: boolean | null; banExpires?: Date | null } } | null | undefined;
  if (!returned || !("user" in returned) || !isBanned(returned.user)) return;
  await ctx.context.internalAdapter.deleteUserSessions(returned.user?.id ?? "");
  return ctx.json(null);
});

function createAuth() {
  return betterAuth({
    appName: "Trainyard",
    baseURL: configuredSiteUrl(),
    secret: process.env.BETTER_AUTH_SECRET,
    trustedOrigins: trustedOrigins(),
    database: drizzleAdapter(getDb(), { provider: "pg", schema }),
    emailAndPassword: {
      enabled: true,
      requireEmailVerification: true,
      minPasswordLength: 8,
      revokeSessionsOnPasswordReset: true,
      sendResetPassword: async ({ user, url }) => {
        await sendMail({
          to: user.email, subject: "Reset your Trainyard password",
          ...linkMail("Someone asked to reset the password of this Trainyard account. If it was you, follow the link within an hour.", url, "Choose a new password", "If it was not you, ignore this message."),
        });
      },
    },
    emailVerification: {
      sendOnSignUp: true,
      sendOnSignIn: true,
      autoSignInAfterVerification: true,
      sendVerificationEmail: async ({ user, url }) => {
        await sendMail({
          to: user.email, subject: "Confirm your e-mail for Trainyard",
          ...linkMail(`Welcome to Trainyard, ${user.name}. Confirm this address to sign in.`, url, "Confirm my e-mail"),
        });
      },
    },
    // On unless switched off (the test runner does, to sign in many times a minute). Counted
    // in PostgreSQL (db/schema-security.ts) so that every app instance shares one window.
    rateLimit: {
      enabled: process.env.TRAINYARD_RATE_LIMIT !== "0", window: 60, max: 100, storage: "database",
      // Enough for a household or a club behind one address, few enough to slow guessing.
      customRules: {
        "/sign-in/email": { window: 60, max: 30 },
        "/sign-up/email": { window: 60, max: 30 },
        "/request-password-reset": { window: 60, max: 10 },
      },
    },
    advanced: {
      database: { generateId: () => crypto.randomUUID() },
      // The front server (lib/dev/serve.ts) replaces X-Forwarded-For with the real client
      // address, so this header can no longer be made up by the client to dodge the limits.
      ipAddress: { ipAddressHeaders: ["x-forwarded-for"] },
    },
    hooks: { before: sessionOfBanned, after: dropBannedSession },
    plugins: [
      admin({ ac: siteAc, roles: siteRoles, defaultRole: "member", adminRoles: ["admin"] }),
      organization({ ac: shopAc, roles: shopRoles, creatorRole: "owner", allowUserToCreateOrganization: true }),
      nextCookies(),
    ],
  });
}

type Auth = ReturnType<typeof createAuth>;
const globalForAuth = globalThis as unknown as { trainyardAuth?: Auth };

/** Created on first use: `next build` imports this module without a database. */
export function getAuth(): Auth {
  globalForAuth.trainyardAuth ??= createAuth();
  return globalForAuth.trainyardAuth;
}
