import { sql } from "drizzle-orm";
import { check, index, integer, pgTable, text, timestamp, uniqueIndex } from "drizzle-orm/pg-core";
import { organization, parts } from "./schema";

// ── Shops (better-auth organizations) and what they stock ────────────────────────────

/** What a shop shows the public beyond its organization row. */
export const shopProfiles = pgTable("shop_profiles", {
  organizationId: text("organization_id").primaryKey().references(() => organization.id, { onDelete: "cascade" }),
  location: text("location"),
  about: text("about"),
  /** ISO 4217 code the shop prices in by default. */
  currency: text("currency").notNull().default("USD"),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

/**
 * One row per catalog part a shop stocks. Available to sell = onHand − reserved; reserved
 * grows when a checkout starts and moves to sold (onHand and reserved both shrink) when it is paid.
 */
export const shopInventory = pgTable("shop_inventory", {
  id: text("id").primaryKey().default(sql`gen_random_uuid()::text`),
  organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
  partId: text("part_id").notNull().references(() => parts.id, { onDelete: "cascade" }),
  sku: text("sku").notNull(),
  /** Smallest currency unit (cents, pence, yen). */
  priceCents: integer("price_cents").notNull(),
  currency: text("currency").notNull(),
  onHand: integer("on_hand").notNull().default(0),
  reserved: integer("reserved").notNull().default(0),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [
  uniqueIndex("shop_inventory_org_part_uq").on(t.organizationId, t.partId),
  uniqueIndex("shop_inventory_org_sku_uq").on(t.organizationId, t.sku),
  index("shop_inventory_part_idx").on(t.partId),
  check("shop_inventory_on_hand_nonneg", sql`${t.onHand} >= 0`),
  check("shop_inventory_reserved_range", sql`${t.reserved} >= 0 AND ${t.reserved} <= ${t.onHand}`),
  check("shop_inventory_price_nonneg", sql`${t.priceCents} >= 0`),
]);

export type ShopProfileRow = typeof shopProfiles.$inferSelect;
export type ShopInventoryRow = typeof shopInventory.$inferSelect;
