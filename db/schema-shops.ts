import { sql } from "drizzle-orm";
import { check, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex } from "drizzle-orm/pg-core";
import { organization, parts, user } from "./schema";

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

/**
 * Keys a shop's own stock system uses to read and write that shop's inventory. Only a SHA-256
 * of the secret is kept; the secret is shown once, when the key is made. Scoped to one shop.
 */
export const shopApiKeys = pgTable("shop_api_keys", {
  id: text("id").primaryKey().default(sql`gen_random_uuid()::text`),
  organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
  name: text("name").notNull(),
  /** The first characters of the key, shown so the owner can tell keys apart. */
  start: text("start").notNull(),
  keyHash: text("key_hash").notNull(),
  createdBy: text("created_by").references(() => user.id, { onDelete: "set null" }),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  lastUsedAt: timestamp("last_used_at", { withTimezone: true }),
  revokedAt: timestamp("revoked_at", { withTimezone: true }),
}, (t) => [
  uniqueIndex("shop_api_keys_hash_uq").on(t.keyHash),
  index("shop_api_keys_org_idx").on(t.organizationId),
]);

/**
 * Solves asked against a shop's stock, kept for "what to stock next". Anonymous by design:
 * no user id at all, only what was asked (the parts that were needed) and how it went.
 */
export const shopSolveLog = pgTable("shop_solve_log", {
  id: text("id").primaryKey().default(sql`gen_random_uuid()::text`),
  organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
  /** ok = answered from stock alone; short = answered only with parts the shop lacks; none = no answer. */
  outcome: text("outcome").notNull(),
  /** Catalog part ids the same question's catalog answer used that the shop lacked (in stock). */
  missingPartIds: jsonb("missing_part_ids").$type<string[]>().notNull().default([]),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [index("shop_solve_log_org_time_idx").on(t.organizationId, t.createdAt)]);

export type ShopApiKeyRow = typeof shopApiKeys.$inferSelect;
export type ShopSolveLogRow = typeof shopSolveLog.$inferSelect;
