import "server-only";
import { getMembership, getShopBySlugOrThrow, type Shop, type ShopRole } from "@/db/queries/shops";
import { findLiveApiKey } from "@/db/queries/shops-keys";
import type { SessionUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { apiKeyFrom, hashApiKey } from "./api-key";

export type ShopActor =
  | { kind: "member"; shop: Shop; user: SessionUser; role: ShopRole; memberId: string }
  | { kind: "api-key"; shop: Shop; keyId: string };

/**
 * The shop named by the URL, for a signed-in member with at least `role`. Unknown shop → 404;
 * signed out → 401; not a member of this shop (even a member of another) or staff where the
 * owner is needed → 403.
 */
export async function requireShopMember({ slug, user, role = "staff" }: { slug: string; user: SessionUser | null; role?: ShopRole }) {
  const shop = await getShopBySlugOrThrow({ slug });
  if (!user) throw new AppError("unauthorized", "Sign in as a member of this shop.");
  const membership = await getMembership({ organizationId: shop.id, userId: user.id });
  if (!membership) throw new AppError("forbidden:shop", `You are not a member of ${shop.name}.`);
  if (role === "owner" && membership.role !== "owner") throw new AppError("forbidden:shop_owner", `Only the owner of ${shop.name} can do this.`);
  return { kind: "member" as const, shop, user, role: membership.role, memberId: membership.id };
}

/**
 * For the stock routes a shop's own system calls: an API key of this shop, or a member's
 * session. A key of another shop is refused (403), never redirected to its own shop.
 */
export async function requireShopActor({ slug, request, user }: { slug: string; request: Request; user: SessionUser | null }): Promise<ShopActor> {
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
  return requireShopMember({ slug, user });
}
