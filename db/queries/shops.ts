import "server-only";
import { hasNul } from "@/lib/validation/nul";
import { and, asc, eq, gt, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { invitation, member, organization, shopInventory, shopProfiles, user } from "@/db/schema";
import { AppError } from "@/lib/errors";

export type ShopRole = "owner" | "staff";
export const asShopRole = (r: string): ShopRole => (r.split(",").includes("owner") ? "owner" : "staff");

const shopColumns = {
  id: organization.id, name: organization.name, slug: organization.slug,
  location: shopProfiles.location, about: shopProfiles.about, currency: sql<string>`coalesce(${shopProfiles.currency}, 'USD')`,
};
export type Shop = { id: string; name: string; slug: string; location: string | null; about: string | null; currency: string };

export async function getShopBySlug({ slug }: { slug: string }): Promise<Shop | null> {
  // PostgreSQL text cannot hold NUL: such a slug names no shop (instead of failing the query).
  if (hasNul(slug)) return null;
  const [row] = await db.select(shopColumns).from(organization)
    .leftJoin(shopProfiles, eq(shopProfiles.organizationId, organization.id)).where(eq(organization.slug, slug)).limit(1);
  return row ?? null;
}

export async function getShopBySlugOrThrow({ slug }: { slug: string }): Promise<Shop> {
  const shop = await getShopBySlug({ slug });
  if (!shop) throw new AppError("not_found:shop", `No shop "${slug}".`);
  return shop;
}

/** Every shop, with how many catalog parts it has in stock. */
export async function listShops() {
  return db.select({
    ...shopColumns,
    inStock: sql<number>`(select count(*)::int from ${shopInventory} i where i.organization_id = ${organization.id} and i.on_hand > i.reserved)`,
  }).from(organization).leftJoin(shopProfiles, eq(shopProfiles.organizationId, organization.id)).orderBy(asc(organization.name));
}

/** The public shop list: every shop without its internal id (the API's and the planner's). */
export async function listPublicShops() {
  return (await listShops()).map(({ id: _id, ...shop }) => shop);
}

/** The shops a user belongs to, with their role in each. */
export async function listShopsOfUser({ userId }: { userId: string }) {
  const rows = await db.select({ ...shopColumns, role: member.role }).from(member)
    .innerJoin(organization, eq(organization.id, member.organizationId))
    .leftJoin(shopProfiles, eq(shopProfiles.organizationId, organization.id))
    .where(eq(member.userId, userId)).orderBy(asc(organization.name));
  return rows.map((r) => ({ ...r, role: asShopRole(r.role), grants: r.role }));
}

export async function getMembership({ organizationId, userId }: { organizationId: string; userId: string }) {
  const [row] = await db.select({ id: member.id, role: member.role }).from(member)
    .where(and(eq(member.organizationId, organizationId), eq(member.userId, userId))).limit(1);
  // `grants` is the stored role as is, for permission checks (canInShop): a stray value grants nothing.
  return row ? { id: row.id, role: asShopRole(row.role), grants: row.role } : null;
}

export async function listMembers({ organizationId }: { organizationId: string }) {
  const rows = await db.select({ id: member.id, userId: member.userId, role: member.role, name: user.name, email: user.email, since: member.createdAt })
    .from(member).innerJoin(user, eq(user.id, member.userId))
    .where(eq(member.organizationId, organizationId)).orderBy(asc(member.createdAt));
  return rows.map((r) => ({ ...r, role: asShopRole(r.role) }));
}

export async function getMemberOrThrow({ organizationId, memberId }: { organizationId: string; memberId: string }) {
  if (hasNul(memberId)) throw new AppError("not_found:member", "No such member of this shop.");
  const [row] = await db.select({ id: member.id, userId: member.userId, role: member.role, email: user.email }).from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(and(eq(member.organizationId, organizationId), eq(member.id, memberId))).limit(1);
  if (!row) throw new AppError("not_found:member", "That person is not a member of this shop.");
  return { ...row, role: asShopRole(row.role) };
}

export async function listPendingInvitations({ organizationId }: { organizationId: string }) {
  return db.select({ id: invitation.id, email: invitation.email, role: invitation.role, expiresAt: invitation.expiresAt })
    .from(invitation)
    .where(and(eq(invitation.organizationId, organizationId), eq(invitation.status, "pending"), gt(invitation.expiresAt, new Date())))
    .orderBy(asc(invitation.createdAt));
}

export async function getInvitation({ id }: { id: string }) {
  if (hasNul(id)) return null;
  const [row] = await db.select({ id: invitation.id, email: invitation.email, status: invitation.status, expiresAt: invitation.expiresAt, shopName: organization.name, shopSlug: organization.slug })
    .from(invitation).innerJoin(organization, eq(organization.id, invitation.organizationId)).where(eq(invitation.id, id)).limit(1);
  return row ?? null;
}
