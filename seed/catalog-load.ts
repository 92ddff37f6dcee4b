// Loads the invented demo catalog as approved parts. Idempotent: keyed by slug.
import { sql } from "drizzle-orm";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import * as schema from "@/db/schema";
import { partInputSchema, slugify } from "@/lib/validation/parts";
import { demoCatalog } from "./catalog";
import { partToRow } from "@/lib/catalog/rows";

type Db = NodePgDatabase<typeof schema>;

export async function seedCatalog(db: Db): Promise<number> {
  const rows = demoCatalog.map((raw) => {
    const p = partInputSchema.parse(raw);
    return { ...partToRow(p), slug: p.slug ?? slugify(p.maker, p.model), status: "approved" as const, reviewedAt: new Date() };
  });
  let added = 0;
  for (let i = 0; i < rows.length; i += 200) {
    const inserted = await db.insert(schema.parts).values(rows.slice(i, i + 200)).onConflictDoNothing({ target: schema.parts.slug }).returning({ id: schema.parts.id });
    added += inserted.length;
  }
  await db.insert(schema.catalogState).values({ id: 1, version: 1 }).onConflictDoNothing();
  if (added > 0) await db.update(schema.catalogState).set({ version: sql`${schema.catalogState.version} + 1`, updatedAt: new Date() });
  return added;
}
