import { sql } from "drizzle-orm";
import { check, index, integer, jsonb, pgTable, text, timestamp } from "drizzle-orm/pg-core";
import { builds, organization, parts, user } from "./schema";
import { shopInventory } from "./schema-shops";

// ── Quotes and orders ──────────────────────────────────────────────────────────────────
// One row follows a buyer's request from "requested" through the shop's quote to payment,
// shipping or refund: the quote *is* the order once paid, so nothing is copied between tables.

/** requested → quoted → awaiting_payment → paid → shipped; cancelled and refunded end it. */
export const ORDER_STATUSES = ["requested", "quoted", "awaiting_payment", "paid", "shipped", "cancelled", "refunded"] as const;
export type OrderStatus = (typeof ORDER_STATUSES)[number];

export const quotes = pgTable("quotes", {
  id: text("id").primaryKey().default(sql`gen_random_uuid()::text`),
  /** Short reference for people and e-mail subjects, e.g. Q-7KM3PX. */
  ref: text("ref").notNull().unique(),
  buyerId: text("buyer_id").notNull().references(() => user.id, { onDelete: "cascade" }),
  organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
  buildId: text("build_id").references(() => builds.id, { onDelete: "set null" }),
  /** Kept so the quote still names its train when the build is deleted. */
  buildSlug: text("build_slug").notNull(),
  buildTitle: text("build_title").notNull(),
  /** The train as the buyer saw it: sky-to-sensor names, for the quote page and e-mails. */
  train: jsonb("train").$type<{ name: string; role: string }[]>().notNull().default([]),
  /** Parts to buy that the shop does not stock, named for the shop's answer. */
  missing: jsonb("missing").$type<{ partId: string; name: string; count: number }[]>().notNull().default([]),
  status: text("status").$type<OrderStatus>().notNull().default("requested"),
  buyerNote: text("buyer_note"),
  shopNote: text("shop_note"),
  /** ISO 4217; every line is in it. */
  currency: text("currency").notNull(),
  shippingCents: integer("shipping_cents").notNull().default(0),
  /** Σ lines + shipping, computed by the server whenever the shop answers. */
  totalCents: integer("total_cents").notNull().default(0),
  validDays: integer("valid_days"),
  quotedAt: timestamp("quoted_at", { withTimezone: true }),
  expiresAt: timestamp("expires_at", { withTimezone: true }),
  /** The open (or last) Checkout Session; stock is reserved while status is awaiting_payment. */
  checkoutSessionId: text("checkout_session_id"),
  checkoutUrl: text("checkout_url"),
  paymentIntentId: text("payment_intent_id"),
  paidAt: timestamp("paid_at", { withTimezone: true }),
  shippedAt: timestamp("shipped_at", { withTimezone: true }),
  tracking: text("tracking"),
  refundId: text("refund_id"),
  refundedAt: timestamp("refunded_at", { withTimezone: true }),
  cancelledAt: timestamp("cancelled_at", { withTimezone: true }),
  cancelReason: text("cancel_reason"),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [
  index("quotes_buyer_idx").on(t.buyerId, t.createdAt),
  index("quotes_org_idx").on(t.organizationId, t.createdAt),
  index("quotes_session_idx").on(t.checkoutSessionId),
  check("quotes_shipping_nonneg", sql`${t.shippingCents} >= 0`),
  check("quotes_status_known", sql`${t.status} in ('requested','quoted','awaiting_payment','paid','shipped','cancelled','refunded')`),
]);

/** One line per stocked part: the shop's SKU and price at the time, the quantity it quotes. */
export const quoteLines = pgTable("quote_lines", {
  id: text("id").primaryKey().default(sql`gen_random_uuid()::text`),
  quoteId: text("quote_id").notNull().references(() => quotes.id, { onDelete: "cascade" }),
  inventoryId: text("inventory_id").references(() => shopInventory.id, { onDelete: "set null" }),
  partId: text("part_id").notNull().references(() => parts.id, { onDelete: "restrict" }),
  position: integer("position").notNull(),
  sku: text("sku").notNull(),
  name: text("name").notNull(),
  /** What the build asked for; the shop may quote a different quantity (0 drops the line). */
  requestedQuantity: integer("requested_quantity").notNull(),
  quantity: integer("quantity").notNull(),
  unitPriceCents: integer("unit_price_cents").notNull(),
}, (t) => [
  index("quote_lines_quote_idx").on(t.quoteId, t.position),
  check("quote_lines_quantity_nonneg", sql`${t.quantity} >= 0`),
  check("quote_lines_price_nonneg", sql`${t.unitPriceCents} >= 0`),
]);

/** Every payment-provider event handled, by its id: a replayed delivery finds its row and changes nothing. */
export const paymentEvents = pgTable("payment_events", {
  eventId: text("event_id").primaryKey(),
  type: text("type").notNull(),
  quoteId: text("quote_id").references(() => quotes.id, { onDelete: "set null" }),
  /** What the event did: "paid", "released", "ignored: …". */
  outcome: text("outcome").notNull(),
  receivedAt: timestamp("received_at", { withTimezone: true }).notNull().defaultNow(),
});

export type QuoteRow = typeof quotes.$inferSelect;
export type QuoteLineRow = typeof quoteLines.$inferSelect;
