import "server-only";
import { and, asc, eq, gt, inArray, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { organization, parts, shopInventory, shopProfiles, shopSolveLog } from "@/db/schema";
import { AppError } from "@/lib/errors";

export type InventoryWrite = { partId: string; sku: string; priceCents: number; currency: string; onHand: number };

/** A shop's stock lines with their catalog parts, by kind and slug. */
export async function listInventory({ organizationId }: { organizationId: string }) {
  return db.select({
    id: shopInventory.id, partId: parts.id, slug: parts.slug, maker: parts.maker, model: parts.model, kind: parts.kind,
    sku: shopInventory.sku, priceCents: shopInventory.priceCents, currency: shopInventory.currency,
    onHand: shopInventory.onHand, reserved: shopInventory.reserved, listPriceCents: parts.listPriceCents, updatedAt: shopInventory.updatedAt,
  }).from(shopInventory).innerJoin(parts, eq(parts.id, shopInventory.partId))
    .where(eq(shopInventory.organizationId, organizationId)).orderBy(asc(parts.kind), asc(parts.slug));
}

/** The catalog parts a shop can sell now (available = on hand − reserved > 0), with the part rows. */
export async function listAvailableStock({ organizationId }: { organizationId: string }) {
  return db.select({ part: parts, priceCents: shopInventory.priceCents, currency: shopInventory.currency, available: sql<number>`(${shopInventory.onHand} - ${shopInventory.reserved})::int` })
    .from(shopInventory).innerJoin(parts, eq(parts.id, shopInventory.partId))
    .where(and(eq(shopInventory.organizationId, organizationId), eq(parts.status, "approved"), gt(shopInventory.onHand, shopInventory.reserved)));
}

/** Every shop's available stock of these catalog parts (for "where to buy"). */
export async function listStockOfParts({ slugs }: { slugs: string[] }) {
  if (!slugs.length) return [];
  return db.select({
    shopSlug: organization.slug, shopName: organization.name, shopCurrency: sql<string>`coalesce(${shopProfiles.currency}, 'USD')`,
    partSlug: parts.slug, priceCents: shopInventory.priceCents, currency: shopInventory.currency,
    available: sql<number>`(${shopInventory.onHand} - ${shopInventory.reserved})::int`,
  }).from(shopInventory)
    .innerJoin(parts, eq(parts.id, shopInventory.partId))
    .innerJoin(organization, eq(organization.id, shopInventory.organizationId))
    .leftJoin(shopProfiles, eq(shopProfiles.organizationId, organization.id))
    .where(inArray(parts.slug, slugs));
}

/** Shops with this part in stock, cheapest first (prices compared within a currency only). */
export async function listShopsStockingPart({ partId }: { partId: string }) {
  return db.select({
    shopSlug: organization.slug, shopName: organization.name, location: shopProfiles.location,
    priceCents: shopInventory.priceCents, currency: shopInventory.currency,
    available: sql<number>`(${shopInventory.onHand} - ${shopInventory.reserved})::int`,
  }).from(shopInventory)
    .innerJoin(organization, eq(organization.id, shopInventory.organizationId))
    .leftJoin(shopProfiles, eq(shopProfiles.organizationId, organization.id))
    .where(and(eq(shopInventory.partId, partId), gt(shopInventory.onHand, shopInventory.reserved)))
    .orderBy(asc(shopInventory.currency), asc(shopInventory.priceCents));
}

/** Stock lines keyed by part id: SKU and reserved count, for checking an import. */
export async function currentStockByPart({ organizationId }: { organizationId: string }) {
  const rows = await db.select({ partId: shopInventory.partId, sku: shopInventory.sku, reserved: shopInventory.reserved })
    .from(shopInventory).where(eq(shopInventory.organizationId, organizationId));
  return new Map(rows.map((r) => [r.partId, { sku: r.sku, reserved: r.reserved }]));
}

/**
 * Add or update stock lines and drop others, all in one transaction: any failure (a SKU
 * another line holds, stock below what orders reserved) rolls everything back.
 */
export async function applyInventory({ organizationId, items, removePartIds = [] }: { organizationId: string; items: InventoryWrite[]; removePartIds?: string[] }) {
  return db.transaction(async (tx) => {
    const existing = await tx.select({ partId: shopInventory.partId, reserved: shopInventory.reserved, sku: shopInventory.sku })
      .from(shopInventory).where(eq(shopInventory.organizationId, organizationId)).for("update");
    const byPart = new Map(existing.map((e) => [e.partId, e]));
    for (const id of removePartIds) {
      if ((byPart.get(id)?.reserved ?? 0) > 0) throw new AppError("conflict:reserved", "A line with stock reserved for an order cannot be removed.", { remove: ["Reserved for an order"] });
    }
    if (removePartIds.length) await tx.delete(shopInventory).where(and(eq(shopInventory.organizationId, organizationId), inArray(shopInventory.partId, removePartIds)));
    // Free SKUs first so two lines can swap SKUs in one upload.
    const moving = items.filter((it) => byPart.has(it.partId) && byPart.get(it.partId)!.sku !== it.sku).map((it) => it.partId);
    if (moving.length) {
      await tx.update(shopInventory).set({ sku: sql`${shopInventory.id}` })
        .where(and(eq(shopInventory.organizationId, organizationId), inArray(shopInventory.partId, moving)));
    }
    const now = new Date();
    for (const it of items) {
      const reserved = byPart.get(it.partId)?.reserved ?? 0;
      if (it.onHand < reserved) throw new AppError("conflict:reserved", `On hand (${it.onHand}) cannot go below the ${reserved} reserved for orders.`, { onHand: [`At least ${reserved} (reserved)`] });
    }
    try {
      for (let i = 0; i < items.length; i += 500) {
        const chunk = items.slice(i, i + 500).map((it) => ({ organizationId, ...it, updatedAt: now }));
        await tx.insert(shopInventory).values(chunk).onConflictDoUpdate({
          target: [shopInventory.organizationId, shopInventory.partId],
          set: { sku: sql`excluded.sku`, priceCents: sql`excluded.price_cents`, currency: sql`excluded.currency`, onHand: sql`excluded.on_hand`, updatedAt: now },
        });
      }
    } catch (err) {
      const code = (err as { code?: string; cause?: { code?: string } }).cause?.code ?? (err as { code?: string }).code;
      if (code === "23505") throw new AppError("conflict:sku", "A SKU is already used by another stocked part of this shop.", { sku: ["Already used by another part"] });
      throw err;
    }
    return { written: items.length, removed: removePartIds.length };
  });
}

// ── The solve log behind "what to stock next" ──────────────────────────────────────

export async function recordShopSolve({ organizationId, outcome, missingPartIds }: { organizationId: string; outcome: "ok" | "short" | "none"; missingPartIds: string[] }) {
  await db.insert(shopSolveLog).values({ organizationId, outcome, missingPartIds });
}

export async function listShopSolvesSince({ organizationId, since }: { organizationId: string; since: Date }) {
  return db.select({ outcome: shopSolveLog.outcome, missingPartIds: shopSolveLog.missingPartIds, createdAt: shopSolveLog.createdAt })
    .from(shopSolveLog).where(and(eq(shopSolveLog.organizationId, organizationId), gt(shopSolveLog.createdAt, since)));
}

export async function listPartsByIds({ ids }: { ids: string[] }) {
  if (!ids.length) return [];
  return db.select({ id: parts.id, slug: parts.slug, maker: parts.maker, model: parts.model, kind: parts.kind, listPriceCents: parts.listPriceCents })
    .from(parts).where(inArray(parts.id, ids));
}

/** Approved parts by slug and by maker + model, for matching import rows. */
export async function catalogLookup() {
  const rows = await db.select({ id: parts.id, slug: parts.slug, maker: parts.maker, model: parts.model }).from(parts).where(eq(parts.status, "approved"));
  return rows;
}
