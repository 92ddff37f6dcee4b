// Test-only seed helper: accounts the demo seed does not have (a second member, a banned user,
// shop staff, another shop and its staff), written straight to the test database the app uses.
// Passwords are hashed with better-auth's own function, so the app's sign-in accepts them.
import { hashPassword } from "better-auth/crypto";
import { eq } from "drizzle-orm";
import { drizzle } from "drizzle-orm/node-postgres";
import pg from "pg";
import * as schema from "@/db/schema";
import { DEMO_SHOP } from "@/seed/accounts";
import { DEMO_PASSWORD } from "./http";

export const DATABASE_URL = process.env.DATABASE_URL ?? "";

export function testDb() {
  if (!DATABASE_URL) throw new Error("DATABASE_URL is not set: run integration tests through `npm test` (or export the app's DATABASE_URL).");
  const pool = new pg.Pool({ connectionString: DATABASE_URL, max: 2 });
  return { db: drizzle(pool, { schema }), pool };
}

type Db = ReturnType<typeof testDb>["db"];

export async function createUser(db: Db, opts: { email: string; name: string; role?: "member" | "moderator" | "admin" }) {
  const id = crypto.randomUUID();
  await db.insert(schema.user).values({ id, email: opts.email, name: opts.name, role: opts.role ?? "member", emailVerified: true });
  await db.insert(schema.account).values({ id: crypto.randomUUID(), accountId: id, providerId: "credential", userId: id, password: await hashPassword(DEMO_PASSWORD) });
  return id;
}

export async function createShop(db: Db, name: string) {
  const id = crypto.randomUUID();
  await db.insert(schema.organization).values({ id, name, slug: `${name.toLowerCase().replace(/[^a-z0-9]+/g, "-")}-${id.slice(0, 6)}` });
  return id;
}

export async function addShopMember(db: Db, shopId: string, userId: string, role: "owner" | "staff") {
  await db.insert(schema.member).values({ id: crypto.randomUUID(), organizationId: shopId, userId, role });
}

export async function demoShopId(db: Db): Promise<string> {
  const [row] = await db.select({ id: schema.organization.id }).from(schema.organization).where(eq(schema.organization.slug, DEMO_SHOP.slug));
  if (!row) throw new Error("the demo shop is missing: was the demo seed run?");
  return row.id;
}

/** A ban written the way an admin tool might leave it: the flag set, sessions untouched. */
export async function setBanned(db: Db, userId: string) {
  await db.update(schema.user).set({ banned: true, banReason: "matrix test" }).where(eq(schema.user.id, userId));
}
