import "server-only";
import { and, asc, desc, eq, gt, inArray, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { member, organization, parts, quoteLines, quotes, shopInventory, shopProfiles, user, type QuoteRow } from "@/db/schema";
import { canInShop, type ShopPermission } from "@/lib/auth/roles";
import { AppError } from "@/lib/errors";
import { hasNul } from "@/lib/validation/nul";

export type ShopRole = "owner" | "staff";

/** The shops a user works for, with their role in each. */
export async function listMemberShops({ userId }: { userId: string }) {
  return db.select({ id: organization.id, name: organization.name, slug: organization.slug, role: member.role })
    .from(member).innerJoin(organization, eq(organization.id, member.organizationId))
    .where(eq(member.userId, userId)).orderBy(asc(organization.name));
}

/** A shop the user belongs to: 404 when there is no such shop, 403 when they are not its member. */
export async function getMemberShopOrThrow({ slug, userId }: { slug: string; userId: string }) {
  if (hasNul(slug)) throw new AppError("not_found:shop", "No shop with this name.");
  const [shop] = await db.select({ id: organization.id, name: organization.name, slug: organization.slug }).from(organization).where(eq(organization.slug, slug));
  if (!shop) throw new AppError("not_found:shop", "No shop with this name.");
  const [m] = await db.select({ role: member.role }).from(member).where(and(eq(member.organizationId, shop.id), eq(member.userId, userId)));
  if (!m || !canInShop(m.role, { order: "read" })) throw new AppError("forbidden:shop", "Only the shop's owner and staff can see its orders.");
  return { ...shop, role: m.role as ShopRole };
}

export async function getShopBySlug({ slug }: { slug: string }) {
  if (hasNul(slug)) return null;
  const [shop] = await db.select({ id: organization.id, name: organization.name, slug: organization.slug, currency: shopProfiles.currency })
    .from(organization).leftJoin(shopProfiles, eq(shopProfiles.organizationId, organization.id)).where(eq(organization.slug, slug));
  return shop ?? null;
}

export async function listShopMemberEmails({ organizationId }: { organizationId: string }): Promise<string[]> {
  const rows = await db.select({ email: user.email }).from(member).innerJoin(user, eq(user.id, member.userId)).where(eq(member.organizationId, organizationId));
  return rows.map((r) => r.email);
}

/** Approved catalog parts by slug → id. */
export async function partIdsBySlug({ slugs }: { slugs: string[] }) {
  if (!slugs.length) return new Map<string, string>();
  const rows = await db.select({ id: parts.id, slug: parts.slug }).from(parts).where(inArray(parts.slug, slugs));
  return new Map(rows.map((r) => [r.slug, r.id]));
}

/** Every shop that stocks at least one of these parts, with its rows for them (available = on hand − reserved). */
export async function listShopsStocking({ partIds }: { partIds: string[] }) {
  if (!partIds.length) return [];
  const rows = await db.select({
    organizationId: organization.id, shopName: organization.name, shopSlug: organization.slug, location: shopProfiles.location,
    inventoryId: shopInventory.id, partId: shopInventory.partId, sku: shopInventory.sku, priceCents: shopInventory.priceCents,
    currency: shopInventory.currency, available: sql<number>`(${shopInventory.onHand} - ${shopInventory.reserved})::int`,
  }).from(shopInventory)
    .innerJoin(organization, eq(organization.id, shopInventory.organizationId))
    .leftJoin(shopProfiles, eq(shopProfiles.organizationId, organization.id))
    .where(inArray(shopInventory.partId, partIds)).orderBy(asc(organization.name));
  const shops = new Map<string, { id: string; name: string; slug: string; location: string | null; rows: typeof rows }>();
  for (const r of rows) {
    const s = shops.get(r.organizationId) ?? { id: r.organizationId, name: r.shopName, slug: r.shopSlug, location: r.location, rows: [] };
    s.rows.push(r);
    shops.set(r.organizationId, s);
  }
  return [...shops.values()];
}

export type QuoteView = Awaited<ReturnType<typeof loadQuote>>;

async function loadQuote(q: QuoteRow) {
  const [shop] = await db.select({ name: organization.name, slug: organization.slug }).from(organization).where(eq(organization.id, q.organizationId));
  const [buyer] = await db.select({ name: user.name, email: user.email }).from(user).where(eq(user.id, q.buyerId));
  const lines = await db.select({
    id: quoteLines.id, partId: quoteLines.partId, partSlug: parts.slug, sku: quoteLines.sku, name: quoteLines.name,
    requestedQuantity: quoteLines.requestedQuantity, quantity: quoteLines.quantity, unitPriceCents: quoteLines.unitPriceCents,
    onHand: shopInventory.onHand, reserved: shopInventory.reserved,
  }).from(quoteLines).innerJoin(parts, eq(parts.id, quoteLines.partId))
    .leftJoin(shopInventory, eq(shopInventory.id, quoteLines.inventoryId))
    .where(eq(quoteLines.quoteId, q.id)).orderBy(asc(quoteLines.position));
  return { quote: q, shop, buyer, lines };
}

/** For the payment webhook and mail only: no viewer, so never for a page or an API answer. */
export async function getQuoteById({ id }: { id: string }) {
  const [q] = await db.select().from(quotes).where(eq(quotes.id, id));
  return q ? loadQuote(q) : null;
}

/**
 * A quote as its buyer or a member of its shop sees it; anyone else gets 404 (a quote's id
 * says nothing to a stranger, not even that it exists).
 */
export async function getQuoteForViewerOrThrow({ id, userId }: { id: string; userId: string }) {
  if (hasNul(id)) throw new AppError("not_found:quote", "No quote or order of yours with this number.");
  const [row] = await db.select({ quote: quotes, memberRole: member.role }).from(quotes)
    .leftJoin(member, and(eq(member.organizationId, quotes.organizationId), eq(member.userId, userId)))
    .where(eq(quotes.id, id)).limit(1);
  // The shop's side sees it only through a role that may read orders; a stray role sees nothing.
  const shopRole = row?.memberRole && canInShop(row.memberRole, { order: "read" }) ? row.memberRole : null;
  if (!row || (row.quote.buyerId !== userId && !shopRole)) throw new AppError("not_found:quote", "No quote or order of yours with this number.");
  const view = await loadQuote(row.quote);
  return { ...view, isBuyer: row.quote.buyerId === userId, shopRole };
}

/** Shop-side steps: the user must be a member of the quote's shop whose role grants `permission`. */
export async function getShopQuoteOrThrow({ id, userId, permission }: { id: string; userId: string; permission: ShopPermission }) {
  const found = await getQuoteForViewerOrThrow({ id, userId });
  if (!found.shopRole) throw new AppError("forbidden:shop", "Only the shop's owner and staff can do this.");
  if (!canInShop(found.shopRole, permission)) throw new AppError("forbidden:shop_role", "Your role at this shop does not allow this; ask its owner.");
  return found;
}

/** Buyer-side steps: only the buyer. */
export async function getBuyerQuoteOrThrow({ id, userId }: { id: string; userId: string }) {
  const found = await getQuoteForViewerOrThrow({ id, userId });
  if (!found.isBuyer) throw new AppError("forbidden:quote", "Only the buyer can do this.");
  return found;
}

const listColumns = {
  id: quotes.id, ref: quotes.ref, status: quotes.status, buildTitle: quotes.buildTitle, buildSlug: quotes.buildSlug,
  currency: quotes.currency, totalCents: quotes.totalCents, expiresAt: quotes.expiresAt, createdAt: quotes.createdAt,
  updatedAt: quotes.updatedAt, paidAt: quotes.paidAt, shippedAt: quotes.shippedAt, tracking: quotes.tracking,
  lineCount: sql<number>`(select count(*)::int from ${quoteLines} where ${quoteLines.quoteId} = ${quotes.id} and ${quoteLines.quantity} > 0)`,
};

export async function listBuyerQuotes({ buyerId }: { buyerId: string }) {
  return db.select({ ...listColumns, shopName: organization.name, shopSlug: organization.slug }).from(quotes)
    .innerJoin(organization, eq(organization.id, quotes.organizationId))
    .where(eq(quotes.buyerId, buyerId)).orderBy(desc(quotes.updatedAt)).limit(200);
}

export async function listShopQuotes({ organizationId }: { organizationId: string }) {
  return db.select({ ...listColumns, buyerName: user.name, buyerEmail: user.email }).from(quotes)
    .innerJoin(user, eq(user.id, quotes.buyerId))
    .where(eq(quotes.organizationId, organizationId)).orderBy(desc(quotes.updatedAt)).limit(500);
}

/** Lines quoted with a quantity: what checkout charges and reserves. */
export async function listChargeableLines({ quoteId }: { quoteId: string }) {
  return db.select().from(quoteLines).where(and(eq(quoteLines.quoteId, quoteId), gt(quoteLines.quantity, 0))).orderBy(asc(quoteLines.position));
}
