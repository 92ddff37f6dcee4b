import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { ownedParts, parts } from "@/db/schema";

/** The user's gear: approved parts they own, with how many. */
export async function listOwnedParts({ userId }: { userId: string }) {
  return db.select({ part: parts, quantity: ownedParts.quantity }).from(ownedParts)
    .innerJoin(parts, eq(parts.id, ownedParts.partId))
    .where(and(eq(ownedParts.userId, userId), eq(parts.status, "approved")))
    .orderBy(asc(parts.kind), asc(parts.slug));
}

export async function setOwnedQuantity({ userId, partId, quantity }: { userId: string; partId: string; quantity: number }) {
  if (quantity <= 0) {
    await db.delete(ownedParts).where(and(eq(ownedParts.userId, userId), eq(ownedParts.partId, partId)));
    return;
  }
  await db.insert(ownedParts).values({ userId, partId, quantity })
    .onConflictDoUpdate({ target: [ownedParts.userId, ownedParts.partId], set: { quantity } });
}

export async function getOwnedQuantity({ userId, partId }: { userId: string; partId: string }): Promise<number> {
  const [row] = await db.select({ quantity: ownedParts.quantity }).from(ownedParts)
    .where(and(eq(ownedParts.userId, userId), eq(ownedParts.partId, partId)));
  return row?.quantity ?? 0;
}
