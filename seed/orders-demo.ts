// What the orders journey needs from the demo shop: a profile and shelves of connecting parts.
// Kept apart from the shops seed and written only when absent (keyed by the shop's slug), so
// whichever seed runs first wins and the other changes nothing.
import { and, eq, inArray } from "drizzle-orm";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import * as schema from "@/db/schema";
import { DEMO_SHOP } from "./accounts";

const STOCKED_KINDS = ["adapter", "spacer", "extension"];

export async function seedOrdersDemo(db: NodePgDatabase<typeof schema>): Promise<number> {
  const [shop] = await db.select({ id: schema.organization.id }).from(schema.organization).where(eq(schema.organization.slug, DEMO_SHOP.slug));
  if (!shop) return 0;
  await db.insert(schema.shopProfiles).values({ organizationId: shop.id, location: "Unit 4, Lantern Row, Eastmere", about: "Adapters, spacers and extensions, cut and threaded on site.", currency: "USD" }).onConflictDoNothing();
  const [any] = await db.select({ id: schema.shopInventory.id }).from(schema.shopInventory).where(eq(schema.shopInventory.organizationId, shop.id)).limit(1);
  if (any) return 0;
  const rows = await db.select({ id: schema.parts.id, slug: schema.parts.slug, listPriceCents: schema.parts.listPriceCents }).from(schema.parts)
    .where(and(eq(schema.parts.status, "approved"), inArray(schema.parts.kind, STOCKED_KINDS)));
  if (!rows.length) return 0;
  await db.insert(schema.shopInventory).values(rows.map((p, i) => ({
    organizationId: shop.id, partId: p.id, sku: `LRO-${String(1001 + i)}`,
    // A little under list price, as a shop that machines its own spacers would ask.
    priceCents: Math.round(((p.listPriceCents ?? 2400) * 0.95) / 5) * 5, currency: "USD", onHand: 4 + (i % 5),
  }))).onConflictDoNothing();
  return rows.length;
}
