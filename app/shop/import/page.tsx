import { PageTitle } from "@/components/ui/card";
import { CsvImport } from "@/components/shops/csv-import";
import { dashboardShopOrNull } from "@/lib/shops/dashboard";

export const metadata = { title: "Import stock" };

export default async function ImportPage() {
  const ctx = await dashboardShopOrNull("/shop/import");
  if (!ctx) return null;
  return (
    <>
      <PageTitle title="Import stock from a CSV" lead="Each row is matched to a catalog part by its slug, or by maker and model. You see the whole file checked first; confirming writes every row at once, or nothing." />
      <CsvImport shopSlug={ctx.shop.slug} />
    </>
  );
}
