// GET/PUT /api/v1/shops/[slug]/inventory — the shop's stock, for its members or its API keys
import { listInventory } from "@/db/queries/shops-inventory";
import { withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { requireShopActor } from "@/lib/shops/access";
import { putInventory } from "@/lib/shops/inventory";
import { inventoryPutSchema } from "@/lib/validation/shops";

export const dynamic = "force-dynamic";
type P = { slug: string };

export const GET = withSession<P>(async (request, { user, params }) => {
  const { shop } = await requireShopActor({ slug: params.slug, request, user, permission: { inventory: "read" } });
  const items = await listInventory({ organizationId: shop.id });
  return Response.json({ shop: { slug: shop.slug, name: shop.name, currency: shop.currency }, items: items.map((i) => ({ ...i, available: i.onHand - i.reserved })) });
}, { anonymous: true });

export const PUT = withSession<P>(async (request, { user, params }) => {
  const { shop } = await requireShopActor({ slug: params.slug, request, user, permission: { inventory: "update" } });
  const body = await parseJsonBody(request, inventoryPutSchema, 2_000_000);
  const result = await putInventory({ organizationId: shop.id, body });
  return Response.json({ written: result.written, removed: result.removed, items: result.items.map((i) => ({ ...i, available: i.onHand - i.reserved })) });
}, { anonymous: true });
