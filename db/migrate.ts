import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import path from "node:path";
import { fileURLToPath } from "node:url";
import pg from "pg";

const migrationsFolder = path.join(path.dirname(fileURLToPath(import.meta.url)), "migrations");

/** Apply the committed migrations in db/migrations. */
export async function migrateDatabase(url: string) {
  const pool = new pg.Pool({ connectionString: url, max: 1 });
  try {
    await migrate(drizzle(pool), { migrationsFolder });
  } finally {
    await pool.end();
  }
}
