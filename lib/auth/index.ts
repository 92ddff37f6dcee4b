import "server-only";
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { admin, organization } from "better-auth/plugins";
import { getDb } from "@/db/client";
import * as schema from "@/db/schema";
import { configuredSiteUrl, trustedOrigins } from "@/lib/http/origin";
import { linkMail, sendMail } from "@/lib/mail";
import { shopAc, shopRoles, siteAc, siteRoles } from "./roles";

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
