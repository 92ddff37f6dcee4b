import "server-only";
// The shop dashboard (/shop/*) works on one shop at a time: the one chosen last (a cookie),
// else the first the user belongs to. Membership is re-checked on every page.
import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import { listShopsOfUser } from "@/db/queries/shops";
import { getSessionUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";

export const SHOP_COOKIE = "ty_shop";

/** For dashboard pages: the signed-in member's current shop, their role, and all their shops. */
export async function requireDashboardShop(next = "/shop") {
  const user = await getSessionUser();
  if (!user) redirect(`/sign-in?next=${encodeURIComponent(next)}`);
  const shops = await listShopsOfUser({ userId: user.id });
  if (!shops.length) throw new AppError("forbidden:shop", "The shop dashboard is for shop owners and staff.");
  const chosen = (await cookies()).get(SHOP_COOKIE)?.value;
  const shop = shops.find((s) => s.slug === chosen) ?? shops[0];
  return { user, shop, role: shop.role, grants: shop.grants, shops };
}

/** For pages under the dashboard layout: null when the layout already shows "not a member". */
export async function dashboardShopOrNull(next = "/shop") {
  try {
    return await requireDashboardShop(next);
  } catch (err) {
    if (err instanceof AppError && err.status === 403) return null;
    throw err;
  }
}
