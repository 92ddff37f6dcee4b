// Demo accounts: invented people on the reserved .test domain, verified, one shared password.
import { hashPassword } from "better-auth/crypto";
import { and, eq } from "drizzle-orm";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import * as schema from "@/db/schema";

export const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? "trainyard-demo";

export const DEMO_ACCOUNTS = [
  { email: "member@trainyard.test", name: "Ines Varga", role: "member" },
  { email: "moderator@trainyard.test", name: "Tomas Rell", role: "moderator" },
  { email: "admin@trainyard.test", name: "Ada Whitcombe", role: "admin" },
  { email: "shop@trainyard.test", name: "Priya Okonjo", role: "member" },
] as const;

export const DEMO_SHOP = { name: "Lantern Row Optics", slug: "lantern-row-optics", ownerEmail: "shop@trainyard.test" };

type Db = NodePgDatabase<typeof schema>;

export async function seedAccounts(db: Db): Promise<Record<string, string>> {
  const ids: Record<string, string> = {};
  for (const a of DEMO_ACCOUNTS) {
    const existing = await db.select({ id: schema.user.id }).from(schema.user).where(eq(schema.user.email, a.email));
    let id = existing[0]?.id;
    if (!id) {
      id = crypto.randomUUID();
      await db.insert(schema.user).values({ id, email: a.email, name: a.name, role: a.role, emailVerified: true });
      await db.insert(schema.account).values({
        id: crypto.randomUUID(), accountId: id, providerId: "credential", userId: id, password: await hashPassword(DEMO_PASSWORD),
      });
    }
    ids[a.email] = id;
  }
  const shop = await db.select({ id: schema.organization.id }).from(schema.organization).where(eq(schema.organization.slug, DEMO_SHOP.slug));
  let shopId = shop[0]?.id;
  if (!shopId) {
    shopId = crypto.randomUUID();
    await db.insert(schema.organization).values({ id: shopId, name: DEMO_SHOP.name, slug: DEMO_SHOP.slug });
  }
  const ownerId = ids[DEMO_SHOP.ownerEmail];
  const membership = await db.select({ id: schema.member.id }).from(schema.member)
    .where(and(eq(schema.member.organizationId, shopId), eq(schema.member.userId, ownerId)));
  if (!membership.length) {
    await db.insert(schema.member).values({ id: crypto.randomUUID(), organizationId: shopId, userId: ownerId, role: "owner" });
  }
  return ids;
}
