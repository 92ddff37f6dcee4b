import { bigint, index, integer, pgTable, text, varchar } from "drizzle-orm/pg-core";

// ── Rate limits kept in PostgreSQL, so every app instance counts against the same window ──

/** better-auth's own limiter (its `storage: "database"`), for the /api/auth routes. */
export const rateLimit = pgTable("rate_limit", {
  id: text("id").primaryKey(),
  key: text("key").notNull().unique(),
  count: integer("count").notNull(),
  lastRequest: bigint("last_request", { mode: "number" }).notNull(),
}, (t) => [index("rate_limit_last_request_idx").on(t.lastRequest)]);

/** rate-limiter-flexible's RateLimiterPostgres table (its own column names), for the app's routes. */
export const appRateLimits = pgTable("app_rate_limits", {
  key: varchar("key", { length: 255 }).primaryKey(),
  points: integer("points").notNull().default(0),
  expire: bigint("expire", { mode: "number" }),
});
