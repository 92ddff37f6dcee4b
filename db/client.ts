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
    // A bounded wait for a connection: while PostgreSQL is down, requests fail fast (503) instead of hanging.
    const pool = new pg.Pool({ connectionString: databaseUrl(), max: 10, connectionTimeoutMillis: 5_000 });
    // An idle client dropped by a restarting server must not take the process down; the pool replaces it.
    pool.on("error", (err) => console.error("database connection lost:", err.message));
    globalForDb.trainyardPool = pool;
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
