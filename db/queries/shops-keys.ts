import "server-only";
import { hasNul } from "@/lib/validation/nul";
import { and, desc, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { organization, shopApiKeys } from "@/db/schema";
import { AppError } from "@/lib/errors";

export async function insertApiKey({ organizationId, name, start, keyHash, createdBy }: { organizationId: string; name: string; start: string; keyHash: string; createdBy: string }) {
  const [row] = await db.insert(shopApiKeys).values({ organizationId, name, start, keyHash, createdBy })
    .returning({ id: shopApiKeys.id, name: shopApiKeys.name, start: shopApiKeys.start, createdAt: shopApiKeys.createdAt });
  return row;
}

export async function listApiKeys({ organizationId }: { organizationId: string }) {
  return db.select({ id: shopApiKeys.id, name: shopApiKeys.name, start: shopApiKeys.start, createdAt: shopApiKeys.createdAt, lastUsedAt: shopApiKeys.lastUsedAt })
    .from(shopApiKeys).where(and(eq(shopApiKeys.organizationId, organizationId), isNull(shopApiKeys.revokedAt))).orderBy(desc(shopApiKeys.createdAt));
}

export async function revokeApiKey({ organizationId, id }: { organizationId: string; id: string }) {
  if (hasNul(id)) throw new AppError("not_found:api_key", "No such key for this shop (it may be revoked already).");
  const rows = await db.update(shopApiKeys).set({ revokedAt: new Date() })
    .where(and(eq(shopApiKeys.organizationId, organizationId), eq(shopApiKeys.id, id), isNull(shopApiKeys.revokedAt))).returning({ id: shopApiKeys.id });
  if (!rows.length) throw new AppError("not_found:api_key", "No such key for this shop (it may be revoked already).");
}

/** The live key with this hash, and the slug of the one shop it belongs to. */
export async function findLiveApiKey({ keyHash }: { keyHash: string }) {
  const [row] = await db.select({ id: shopApiKeys.id, organizationId: shopApiKeys.organizationId, shopSlug: organization.slug })
    .from(shopApiKeys).innerJoin(organization, eq(organization.id, shopApiKeys.organizationId))
    .where(and(eq(shopApiKeys.keyHash, keyHash), isNull(shopApiKeys.revokedAt))).limit(1);
  if (row) await db.update(shopApiKeys).set({ lastUsedAt: new Date() }).where(eq(shopApiKeys.id, row.id));
  return row ?? null;
}
