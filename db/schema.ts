import { relations, sql } from "drizzle-orm";
import {
  boolean, doublePrecision, index, integer, jsonb, pgTable, primaryKey, text, timestamp, uniqueIndex,
} from "drizzle-orm/pg-core";
import type { PartSpecs } from "@/lib/validation/parts";
import { searchCompactSql, searchWordsSql } from "./search-sql";

// ── Accounts (the tables better-auth reads and writes; see lib/auth.ts) ─────────────────

export const user = pgTable("user", {
  id: text("id").primaryKey(),
  name: text("name").notNull(),
  email: text("email").notNull().unique(),
  emailVerified: boolean("email_verified").notNull().default(false),
  image: text("image"),
  role: text("role").default("member"),
  banned: boolean("banned").default(false),
  banReason: text("ban_reason"),
  banExpires: timestamp("ban_expires", { withTimezone: true }),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

export const session = pgTable("session", {
  id: text("id").primaryKey(),
  expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  token: text("token").notNull().unique(),
  ipAddress: text("ip_address"),
  userAgent: text("user_agent"),
  userId: text("user_id").notNull().references(() => user.id, { onDelete: "cascade" }),
  impersonatedBy: text("impersonated_by"),
  activeOrganizationId: text("active_organization_id"),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [index("session_user_idx").on(t.userId)]);

export const account = pgTable("account", {
  id: text("id").primaryKey(),
  accountId: text("account_id").notNull(),
  providerId: text("provider_id").notNull(),
  userId: text("user_id").notNull().references(() => user.id, { onDelete: "cascade" }),
  accessToken: text("access_token"),
  refreshToken: text("refresh_token"),
  idToken: text("id_token"),
  accessTokenExpiresAt: timestamp("access_token_expires_at", { withTimezone: true }),
  refreshTokenExpiresAt: timestamp("refresh_token_expires_at", { withTimezone: true }),
  scope: text("scope"),
  password: text("password"),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [index("account_user_idx").on(t.userId), uniqueIndex("account_provider_uq").on(t.providerId, t.accountId)]);

export const verification = pgTable("verification", {
  id: text("id").primaryKey(),
  identifier: text("identifier").notNull(),
  value: text("value").notNull(),
  expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [index("verification_identifier_idx").on(t.identifier)]);

// Shops are better-auth organizations; their members are owner or staff.
export const organization = pgTable("organization", {
  id: text("id").primaryKey(),
  name: text("name").notNull(),
  slug: text("slug").notNull().unique(),
  logo: text("logo"),
  metadata: text("metadata"),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
});

export const member = pgTable("member", {
  id: text("id").primaryKey(),
  organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
  userId: text("user_id").notNull().references(() => user.id, { onDelete: "cascade" }),
  role: text("role").notNull().default("staff"),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [uniqueIndex("member_org_user_uq").on(t.organizationId, t.userId)]);

export const invitation = pgTable("invitation", {
  id: text("id").primaryKey(),
  organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
  email: text("email").notNull(),
  role: text("role"),
  status: text("status").notNull().default("pending"),
  expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  inviterId: text("inviter_id").notNull().references(() => user.id, { onDelete: "cascade" }),
});

// ── Catalog ───────────────────────────────────────────────────────────────────────────

export const parts = pgTable("parts", {
  id: text("id").primaryKey().default(sql`gen_random_uuid()::text`),
  slug: text("slug").notNull().unique(),
  kind: text("kind").notNull(),
  maker: text("maker").notNull(),
  model: text("model").notNull(),
  description: text("description"),
  frontInterface: text("front_interface"),
  frontGender: text("front_gender"),
  rearInterface: text("rear_interface"),
  rearGender: text("rear_gender"),
  lengthMm: doublePrecision("length_mm").notNull(),
  adjustMm: doublePrecision("adjust_mm"),
  reversible: boolean("reversible").notNull().default(false),
  clearApertureMm: doublePrecision("clear_aperture_mm"),
  weightG: doublePrecision("weight_g"),
  listPriceCents: integer("list_price_cents"),
  specs: jsonb("specs").$type<PartSpecs>().notNull().default({}),
  status: text("status").notNull().default("pending"),
  submittedBy: text("submitted_by").references(() => user.id, { onDelete: "set null" }),
  reviewedBy: text("reviewed_by").references(() => user.id, { onDelete: "set null" }),
  reviewReason: text("review_reason"),
  specSheetKey: text("spec_sheet_key"),
  specSheetType: text("spec_sheet_type"),
  probableDuplicateOf: text("probable_duplicate_of"),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  reviewedAt: timestamp("reviewed_at", { withTimezone: true }),
}, (t) => [
  index("parts_status_kind_idx").on(t.status, t.kind),
  index("parts_front_idx").on(t.frontInterface),
  index("parts_rear_idx").on(t.rearInterface),
  index("parts_maker_model_idx").on(t.maker, t.model),
  // Part search (db/search-sql.ts): trigram indexes over the normalised words, with and without spaces.
  index("parts_search_trgm_idx").using("gin", sql`${searchWordsSql(t)} gin_trgm_ops`),
  index("parts_search_compact_trgm_idx").using("gin", sql`${searchCompactSql(t)} gin_trgm_ops`),
]);

/** One row: bumped whenever the set of approved parts or an approved part changes. */
export const catalogState = pgTable("catalog_state", {
  id: integer("id").primaryKey().default(1),
  version: integer("version").notNull().default(1),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

export const ownedParts = pgTable("owned_parts", {
  userId: text("user_id").notNull().references(() => user.id, { onDelete: "cascade" }),
  partId: text("part_id").notNull().references(() => parts.id, { onDelete: "cascade" }),
  quantity: integer("quantity").notNull().default(1),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [primaryKey({ columns: [t.userId, t.partId] })]);

// ── Builds ────────────────────────────────────────────────────────────────────────────

export const builds = pgTable("builds", {
  id: text("id").primaryKey().default(sql`gen_random_uuid()::text`),
  slug: text("slug").notNull().unique(),
  ownerId: text("owner_id").notNull().references(() => user.id, { onDelete: "cascade" }),
  title: text("title").notNull(),
  notes: text("notes"),
  visibility: text("visibility").notNull().default("unlisted"),
  request: jsonb("request").notNull(),
  solutionIndex: integer("solution_index").notNull().default(0),
  result: jsonb("result").notNull(),
  partIds: text("part_ids").array().notNull().default(sql`'{}'::text[]`),
  fits: boolean("fits").notNull().default(true),
  checkReason: text("check_reason"),
  checkedAt: timestamp("checked_at", { withTimezone: true }).notNull().defaultNow(),
  checkedCatalogVersion: integer("checked_catalog_version"),
  endorsedAt: timestamp("endorsed_at", { withTimezone: true }),
  endorsedBy: text("endorsed_by").references(() => user.id, { onDelete: "set null" }),
  hiddenAt: timestamp("hidden_at", { withTimezone: true }),
  hiddenReason: text("hidden_reason"),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [
  index("builds_owner_idx").on(t.ownerId),
  index("builds_listing_idx").on(t.visibility, t.endorsedAt, t.createdAt),
  // The re-check finds builds by the catalog parts they use.
  index("builds_part_ids_idx").using("gin", t.partIds),
]);

export const buildThreads = pgTable("build_threads", {
  id: text("id").primaryKey().default(sql`gen_random_uuid()::text`),
  buildId: text("build_id").notNull().references(() => builds.id, { onDelete: "cascade" }),
  url: text("url").notNull(),
  addedBy: text("added_by").references(() => user.id, { onDelete: "set null" }),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [uniqueIndex("build_threads_uq").on(t.buildId, t.url)]);

export const buildAudit = pgTable("build_audit", {
  id: text("id").primaryKey().default(sql`gen_random_uuid()::text`),
  buildId: text("build_id").notNull().references(() => builds.id, { onDelete: "cascade" }),
  actorId: text("actor_id").references(() => user.id, { onDelete: "set null" }),
  action: text("action").notNull(),
  detail: jsonb("detail"),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
}, (t) => [index("build_audit_build_idx").on(t.buildId)]);

// ── Local mail fake ───────────────────────────────────────────────────────────────────

/** Messages caught by the local SMTP fake (development and tests only). */
export const mailOutbox = pgTable("mail_outbox", {
  id: text("id").primaryKey().default(sql`gen_random_uuid()::text`),
  to: text("to").notNull(),
  from: text("from"),
  subject: text("subject").notNull(),
  text: text("text"),
  html: text("html"),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
});

export const buildsRelations = relations(builds, ({ one, many }) => ({
  owner: one(user, { fields: [builds.ownerId], references: [user.id] }),
  threads: many(buildThreads),
  audit: many(buildAudit),
}));
export const buildThreadsRelations = relations(buildThreads, ({ one }) => ({
  build: one(builds, { fields: [buildThreads.buildId], references: [builds.id] }),
}));
export const buildAuditRelations = relations(buildAudit, ({ one }) => ({
  build: one(builds, { fields: [buildAudit.buildId], references: [builds.id] }),
}));

export type User = typeof user.$inferSelect;
export type PartRow = typeof parts.$inferSelect;
export type NewPartRow = typeof parts.$inferInsert;
export type BuildRow = typeof builds.$inferSelect;
export type MailRow = typeof mailOutbox.$inferSelect;

export * from "./schema-shops";
export * from "./schema-orders";
export * from "./schema-security";
