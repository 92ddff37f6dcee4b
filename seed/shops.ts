// Three invented shops with different stock, prices and currencies, each with an owner;
// Lantern Row Optics also has a staff member. Idempotent: keyed by shop slug and part.
import { and, eq, inArray } from "drizzle-orm";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import * as schema from "@/db/schema";

type Db = NodePgDatabase<typeof schema>;
type Pick = { slug: string; listPriceCents: number | null };

export type DemoShop = {
  slug: string; name: string; location: string; about: string; currency: string;
  owner: string; staff?: string[];
  /** Which catalog parts it stocks, and its price for one (smallest unit of its currency). */
  stocks: (slug: string) => boolean;
  price: (p: Pick) => number;
};

// A small deterministic spread of quantities, so every seed run looks the same.
const spread = (slug: string, max: number) => [...slug].reduce((h, c) => (h * 31 + c.charCodeAt(0)) >>> 0, 7) % max;

export const DEMO_SHOPS: DemoShop[] = [
  {
    slug: "lantern-row-optics", name: "Lantern Row Optics", location: "14 Lantern Row, Port Calder", currency: "USD",
    about: "A workshop counter for imagers: Tarrant spacers in every stock length, step-down adapters and helical extensions.",
    owner: "shop@trainyard.test", staff: ["staff@trainyard.test"],
    stocks: (s) => s.startsWith("tarrant-machining-"),
    price: (p) => p.listPriceCents ?? 2500,
  },
  {
    slug: "tidewater-scope-exchange", name: "Tidewater Scope Exchange", location: "Quay 4, Brennmouth", currency: "EUR",
    about: "Camera-maker spacers and sliding extensions, priced in euros; second-hand optics by arrangement.",
    owner: "tidewater@trainyard.test",
    stocks: (s) => s.startsWith("quillfield-imaging-") || s.startsWith("wrenfold-adapters-"),
    price: (p) => Math.round(((p.listPriceCents ?? 2500) * 0.93) / 10) * 10,
  },
  {
    slug: "kilnworth-astro-supply", name: "Kilnworth Astro Supply", location: "Unit 7, Kilnworth Yard, Esterby", currency: "GBP",
    about: "Wide-thread specialists: M54 and M68 spacers for large sensors, and a few M48 lengths.",
    owner: "kilnworth@trainyard.test",
    stocks: (s) => s.startsWith("nettlebeck-instruments-m54-") || s.startsWith("ashdown-glassworks-m68-")
      || ["tarrant-machining-m48-spacer-2-mm", "tarrant-machining-m48-spacer-3-mm", "tarrant-machining-m48-spacer-15-mm"].includes(s),
    price: (p) => Math.round(((p.listPriceCents ?? 2500) * 0.79) / 5) * 5,
  },
];

const CONNECTORS = ["adapter", "spacer", "extension"];

export async function seedShops(db: Db, userIds: Record<string, string>) {
  const catalog = await db.select({ id: schema.parts.id, slug: schema.parts.slug, kind: schema.parts.kind, listPriceCents: schema.parts.listPriceCents })
    .from(schema.parts).where(and(eq(schema.parts.status, "approved"), inArray(schema.parts.kind, CONNECTORS)));
  for (const shop of DEMO_SHOPS) {
    const [existing] = await db.select({ id: schema.organization.id }).from(schema.organization).where(eq(schema.organization.slug, shop.slug));
    const orgId = existing?.id ?? crypto.randomUUID();
    if (!existing) await db.insert(schema.organization).values({ id: orgId, name: shop.name, slug: shop.slug });
    await db.insert(schema.shopProfiles).values({ organizationId: orgId, location: shop.location, about: shop.about, currency: shop.currency })
      .onConflictDoNothing();
    const people: [string, "owner" | "staff"][] = [[shop.owner, "owner"], ...(shop.staff ?? []).map((e) => [e, "staff"] as [string, "staff"])];
    for (const [email, role] of people) {
      const userId = userIds[email];
      if (!userId) continue;
      await db.insert(schema.member).values({ id: crypto.randomUUID(), organizationId: orgId, userId, role }).onConflictDoNothing();
    }
    const stocked = await db.select({ id: schema.shopInventory.id }).from(schema.shopInventory).where(eq(schema.shopInventory.organizationId, orgId)).limit(1);
    if (stocked.length) continue; // stock already seeded: leave what the shop changed since
    const lines = catalog.filter((p) => shop.stocks(p.slug)).map((p, i) => {
      const onHand = spread(p.slug, 9); // 0–8: a few lines are sold out
      return {
        organizationId: orgId, partId: p.id, sku: `${shop.slug.split("-")[0].slice(0, 3).toUpperCase()}-${String(1001 + i)}`,
        priceCents: shop.price(p), currency: shop.currency, onHand, reserved: onHand > 4 && i % 5 === 0 ? 1 : 0,
      };
    });
    if (lines.length) await db.insert(schema.shopInventory).values(lines);
  }
}
