import "server-only";
import { and, desc, eq, gt, isNotNull, isNull, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { builds, parts, shopInventory } from "@/db/schema";

/** What a shop has available now, grouped for its public page. */
export async function listPublicStock({ organizationId }: { organizationId: string }) {
  return db.select({
    slug: parts.slug, maker: parts.maker, model: parts.model, kind: parts.kind, front: parts.frontInterface, rear: parts.rearInterface,
    priceCents: shopInventory.priceCents, currency: shopInventory.currency, available: sql<number>`(${shopInventory.onHand} - ${shopInventory.reserved})::int`,
  }).from(shopInventory).innerJoin(parts, eq(parts.id, shopInventory.partId))
    .where(and(eq(shopInventory.organizationId, organizationId), gt(shopInventory.onHand, shopInventory.reserved), eq(parts.status, "approved")))
    .orderBy(parts.kind, parts.frontInterface, parts.lengthMm);
}

/**
 * The shop's reference builds: public, endorsed builds whose parts include at least one the
 * shop has in stock, with how many of their parts it stocks.
 */
export async function listShopReferenceBuilds({ organizationId, limit = 6 }: { organizationId: string; limit?: number }) {
  const stocked = sql`(select coalesce(array_agg(p.slug), '{}') from ${shopInventory} i join ${parts} p on p.id = i.part_id where i.organization_id = ${organizationId} and i.on_hand > i.reserved)`;
  return db.select({
    slug: builds.slug, title: builds.title, partCount: sql<number>`cardinality(${builds.partIds})`,
    stockedCount: sql<number>`cardinality(array(select unnest(${builds.partIds}) intersect select unnest(${stocked})))`,
  }).from(builds)
    .where(and(eq(builds.visibility, "public"), isNotNull(builds.endorsedAt), isNull(builds.hiddenAt), sql`${builds.partIds} && ${stocked}`))
    .orderBy(desc(builds.endorsedAt)).limit(limit);
}
