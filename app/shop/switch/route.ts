// GET /shop/switch?to=<slug> — choose which of your shops the dashboard shows (membership checked)
import { NextResponse } from "next/server";
import { listShopsOfUser } from "@/db/queries/shops";
import { getSessionUser } from "@/lib/auth/session";
import { SHOP_COOKIE } from "@/lib/shops/dashboard";

export async function GET(request: Request) {
  const url = new URL(request.url);
  const user = await getSessionUser(request.headers);
  const res = NextResponse.redirect(new URL("/shop", url), 303);
  if (!user) return NextResponse.redirect(new URL("/sign-in?next=/shop", url), 303);
  const to = url.searchParams.get("to") ?? "";
  const shops = await listShopsOfUser({ userId: user.id });
  if (shops.some((s) => s.slug === to)) res.cookies.set(SHOP_COOKIE, to, { path: "/", httpOnly: true, sameSite: "lax", maxAge: 60 * 60 * 24 * 365 });
  return res;
}
