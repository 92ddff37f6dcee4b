// The demo member's bench: a wheel, a camera and a few spacers, so "What I own, then the
// catalog" has something to count as free. Idempotent.
import { eq, inArray } from "drizzle-orm";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import * as schema from "@/db/schema";
import { DEMO_CASES } from "./catalog";

const OWNED: [slug: string, quantity: number][] = [
  [DEMO_CASES.flagship.camera, 1],
  [DEMO_CASES.flagship.stations[0], 1],
  ["tarrant-machining-m48-spacer-10-mm", 1],
  ["tarrant-machining-m48-spacer-30-mm", 1],
];

export async function seedGear(db: NodePgDatabase<typeof schema>, userId: string) {
  const rows = await db.select({ id: schema.parts.id, slug: schema.parts.slug }).from(schema.parts).where(inArray(schema.parts.slug, OWNED.map(([s]) => s)));
  const idOf = new Map(rows.map((r) => [r.slug, r.id]));
  const existing = await db.select({ partId: schema.ownedParts.partId }).from(schema.ownedParts).where(eq(schema.ownedParts.userId, userId));
  if (existing.length) return;
  const values = OWNED.filter(([s]) => idOf.has(s)).map(([s, quantity]) => ({ userId, partId: idOf.get(s)!, quantity }));
  if (values.length) await db.insert(schema.ownedParts).values(values).onConflictDoNothing();
}
