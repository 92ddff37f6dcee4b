// GET /api/v1/shops — every shop, with how many parts it has in stock (public)
import { listShops } from "@/db/queries/shops";
import { withSession } from "@/lib/auth/session";

export const dynamic = "force-dynamic";

export const GET = withSession(async () => {
  const shops = await listShops();
  return Response.json({ shops: shops.map(({ id: _id, ...s }) => s) });
}, { anonymous: true });
