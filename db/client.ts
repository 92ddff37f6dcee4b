import "server-only";
import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import pg from "pg";
import * as schema from "./schema";

export type Db = NodePgDatabase<typeof schema>;

const globalForDb = globalThis as unknown as { trainyardPool?: pg.Pool; trainyardDb?: Db };

function databaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set (npm start sets it for the embedded PostgreSQL)");
  return url;
}

/** The shared pool, created on first use so that `next build` never connects. */
export function getDb(): Db {
  if (!globalForDb.trainyardDb) {
    globalForDb.trainyardPool = new pg.Pool({ connectionString: databaseUrl(), max: 10 });
    globalForDb.trainyardDb = drizzle(globalForDb.trainyardPool, { schema });
  }
  return globalForDb.trainyardDb;
}

export const db: Db = new Proxy({} as Db, {
  get: (_t, prop) => Reflect.get(getDb() as object, prop),
});

export async function pingDb(): Promise<boolean> {
  try {
    getDb();
    await globalForDb.trainyardPool!.query("select 1");
    return true;
  } catch {
    return false;
  }
}
