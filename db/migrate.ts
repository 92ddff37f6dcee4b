import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import path from "node:path";
import { fileURLToPath } from "node:url";
import pg from "pg";

const migrationsFolder = path.join(path.dirname(fileURLToPath(import.meta.url)), "migrations");

/**
 * Steps drizzle cannot express, run before the migrations and safe to repeat: pg_trgm gives
 * part search its trigram similarity and indexes (db/search-sql.ts). It ships with Debian's
 * postgresql package (contrib); creating it needs a superuser or a trusted-extension grant.
 */
const PRE_MIGRATION_STEPS = ["CREATE EXTENSION IF NOT EXISTS pg_trgm"];

/** Apply the committed migrations in db/migrations. */
export async function migrateDatabase(url: string) {
  const pool = new pg.Pool({ connectionString: url, max: 1 });
  try {
    for (const step of PRE_MIGRATION_STEPS) await pool.query(step);
    await migrate(drizzle(pool), { migrationsFolder });
  } finally {
    await pool.end();
  }
}
