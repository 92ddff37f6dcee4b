// GET /api/v1/shops — every shop, with how many parts it has in stock (public)
import { listPublicShops } from "@/db/queries/shops";
import { withSession } from "@/lib/auth/session";

export const dynamic = "force-dynamic";

export const GET = withSession(async () => {
  return Response.json({ shops: await listPublicShops() });
}, { anonymous: true });
