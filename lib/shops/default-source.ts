import "server-only";
import { cookies } from "next/headers";
import { listShopsOfUser } from "@/db/queries/shops";
import type { SessionUser } from "@/lib/auth/session";
import type { PlanState } from "@/lib/planner/url-state";
import { SHOP_COOKIE } from "./dashboard";

/** For a shop's owner or staff opening the planner without a source: their (current) shop. */
export async function defaultShopSource({ user, params }: { user: SessionUser | null; params: URLSearchParams }): Promise<Partial<PlanState>> {
  if (!user || params.has("source")) return {};
  const shops = await listShopsOfUser({ userId: user.id }).catch(() => []);
  if (!shops.length) return {};
  const chosen = (await cookies()).get(SHOP_COOKIE)?.value;
  const shop = shops.find((s) => s.slug === chosen) ?? shops[0];
  return { source: "shop", shop: shop.slug };
}
