import "server-only";
import { getMembership, getShopBySlugOrThrow, type Shop, type ShopRole } from "@/db/queries/shops";
import { findLiveApiKey } from "@/db/queries/shops-keys";
import { canInShop, type ShopPermission } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { apiKeyFrom, hashApiKey } from "./api-key";

export type ShopActor =
  | { kind: "member"; shop: Shop; user: SessionUser; role: ShopRole; memberId: string }
  | { kind: "api-key"; shop: Shop; keyId: string };

/**
 * The shop named by the URL, for a signed-in member whose shop role grants `permission`
 * (lib/auth/roles.ts). Unknown shop → 404; signed out → 401; not a member of this shop (even a
 * member of another) or a role without the permission → 403.
 */
export async function requireShopMember({ slug, user, permission }: { slug: string; user: SessionUser | null; permission: ShopPermission }) {
  const shop = await getShopBySlugOrThrow({ slug });
  if (!user) throw new AppError("unauthorized", "Sign in as a member of this shop.");
  const membership = await getMembership({ organizationId: shop.id, userId: user.id });
  if (!membership) throw new AppError("forbidden:shop", `You are not a member of ${shop.name}.`);
  if (!canInShop(membership.grants, permission)) throw new AppError("forbidden:shop_role", `Your role at ${shop.name} does not allow this; ask its owner.`);
  return { kind: "member" as const, shop, user, role: membership.role as ShopRole, memberId: membership.id };
}

/**
 * For the stock routes a shop's own system calls: an API key of this shop, or a member's
 * session. A key of another shop is refused (403), never redirected to its own shop.
 */
export async function requireShopActor({ slug, request, user, permission }: { slug: string; request: Request; user: SessionUser | null; permission: { inventory: "read" | "update" } }): Promise<ShopActor> {
  const key = apiKeyFrom(request.headers);
  const presented = request.headers.get("authorization")?.startsWith("Bearer ") || request.headers.has("x-api-key");
  if (presented && !key) throw new AppError("unauthorized:api_key", "That is not a Trainyard shop API key.");
  if (key) {
    const shop = await getShopBySlugOrThrow({ slug });
    const found = await findLiveApiKey({ keyHash: hashApiKey(key) });
    if (!found) throw new AppError("unauthorized:api_key", "This API key is unknown or revoked.");
    if (found.organizationId !== shop.id) throw new AppError("forbidden:shop", "This API key belongs to another shop.");
    return { kind: "api-key", shop, keyId: found.id };
  }
  return requireShopMember({ slug, user, permission });
}
