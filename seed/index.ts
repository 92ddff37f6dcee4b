import { drizzle } from "drizzle-orm/node-postgres";
import pg from "pg";
import * as schema from "@/db/schema";
import { seedAccounts } from "./accounts";
import { seedCatalog } from "./catalog-load";
import { seedGear } from "./gear";
import { seedShops } from "./shops";
import { seedOrdersDemo } from "./orders-demo";

/** Seed the demo scenario: accounts, the demo shop and the invented catalog. Safe to repeat. */
export async function seedDemo(databaseUrl: string, log: (m: string) => void = console.log) {
  const pool = new pg.Pool({ connectionString: databaseUrl, max: 2 });
  const db = drizzle(pool, { schema });
  try {
    const ids = await seedAccounts(db);
    const added = await seedCatalog(db);
    await seedGear(db, ids["member@trainyard.test"]);
    await seedShops(db, ids);
    await seedOrdersDemo(db);
    log(`[seed] demo accounts ready; ${added} catalog parts added`);
  } finally {
    await pool.end();
  }
}
