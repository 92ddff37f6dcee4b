// GET /api/v1/shops/[slug]/inventory/export — the stock as CSV (formula-looking cells neutralised)
import { listInventory } from "@/db/queries/shops-inventory";
import { withSession } from "@/lib/auth/session";
import { requireShopActor } from "@/lib/shops/access";
import { exportInventoryCsv } from "@/lib/shops/csv";

export const dynamic = "force-dynamic";

export const GET = withSession<{ slug: string }>(async (request, { user, params }) => {
  const { shop } = await requireShopActor({ slug: params.slug, request, user, permission: { inventory: "read" } });
  const csv = exportInventoryCsv(await listInventory({ organizationId: shop.id }));
  const day = new Date().toISOString().slice(0, 10);
  return new Response(`\uFEFF${csv}\r\n`, {
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="${shop.slug}-stock-${day}.csv"`, "cache-control": "no-store" },
  });
}, { anonymous: true });
