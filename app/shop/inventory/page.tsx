import { PageTitle } from "@/components/ui/card";
import { InventoryTable } from "@/components/shops/inventory-table";
import { listInventory } from "@/db/queries/shops-inventory";
import { dashboardShopOrNull } from "@/lib/shops/dashboard";

export const metadata = { title: "Inventory" };

export default async function InventoryPage() {
  const ctx = await dashboardShopOrNull("/shop/inventory");
  if (!ctx) return null;
  const items = await listInventory({ organizationId: ctx.shop.id });
  return (
    <>
      <PageTitle title="Inventory" lead="Every catalog part you stock: your SKU, your price, what is on hand. The planner offers only what is available (on hand − reserved).">
        <a href={`/api/v1/shops/${ctx.shop.slug}/inventory/export`} className="text-sm underline decoration-brass underline-offset-4">Export as CSV</a>
      </PageTitle>
      <InventoryTable shopSlug={ctx.shop.slug} currency={ctx.shop.currency} initial={items} />
    </>
  );
}
