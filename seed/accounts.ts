// Demo accounts: invented people on the reserved .test domain, verified, one shared password.
import { hashPassword } from "better-auth/crypto";
import { eq } from "drizzle-orm";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import * as schema from "@/db/schema";

export const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? "trainyard-demo";

export const DEMO_ACCOUNTS = [
  { email: "member@trainyard.test", name: "Ines Varga", role: "member" },
  { email: "moderator@trainyard.test", name: "Tomas Rell", role: "moderator" },
  { email: "admin@trainyard.test", name: "Ada Whitcombe", role: "admin" },
  { email: "shop@trainyard.test", name: "Priya Okonjo", role: "member" },
  { email: "staff@trainyard.test", name: "Jonah Brisk", role: "member" },
  { email: "tidewater@trainyard.test", name: "Halvard Teague", role: "member" },
  { email: "kilnworth@trainyard.test", name: "Maren Holloway", role: "member" },
] as const;

/** The demo shop the shop account owns; all three demo shops are in seed/shops.ts. */
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
  return ids;
}
