// POST /api/v1/shops/[slug]/inventory/import[?confirm=1] — check a stock CSV (preview), or apply it all-or-nothing
import { withSession } from "@/lib/auth/session";
import { requireShopMember } from "@/lib/shops/access";
import { importInventoryCsv } from "@/lib/shops/inventory";
import { readCsvUpload } from "@/lib/shops/read-upload";

export const dynamic = "force-dynamic";

export const POST = withSession<{ slug: string }>(async (request, { user, params }) => {
  const { shop } = await requireShopMember({ slug: params.slug, user, permission: { inventory: "update" } });
  const text = await readCsvUpload(request);
  const confirm = new URL(request.url).searchParams.get("confirm") === "1";
  const result = await importInventoryCsv({ organizationId: shop.id, text, confirm });
  return Response.json(result);
});
