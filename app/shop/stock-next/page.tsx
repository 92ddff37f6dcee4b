import Link from "next/link";
import { PageTitle } from "@/components/ui/card";
import { KIND_LABELS } from "@/lib/format";
import { dashboardShopOrNull } from "@/lib/shops/dashboard";
import { stockNextForShop } from "@/lib/shops/stock-next-query";

export const metadata = { title: "What to stock next" };

export default async function StockNextPage() {
  const ctx = await dashboardShopOrNull("/shop/stock-next");
  if (!ctx) return null;
  const next = await stockNextForShop({ organizationId: ctx.shop.id });
  return (
    <>
      <PageTitle title="What to stock next" lead={`From the ${next.total} plan${next.total === 1 ? "" : "s"} made with your stock in the last ${next.days} days: ${next.unanswered} could not be answered from it. These catalog parts would have answered the most of them.`} />
      {next.suggestions.length ? (
        <div className="overflow-x-auto rounded-lg border border-line bg-surface">
          <table className="w-full text-sm">
            <caption className="sr-only">Parts to stock, most useful first</caption>
            <thead className="border-b border-line bg-sunken text-left text-xs uppercase tracking-wide text-muted">
              <tr><th className="px-3 py-2">#</th><th className="px-3 py-2">Catalog part</th><th className="px-3 py-2 text-right">Plans answered</th><th className="px-3 py-2 text-right">Plans that used it</th></tr>
            </thead>
            <tbody>
              {next.suggestions.map((s, i) => (
                <tr key={s.partId} className="border-b border-line/60 last:border-0">
                  <td className="num px-3 py-2 text-muted">{i + 1}</td>
                  <td className="px-3 py-2"><Link href={`/parts/${s.part.slug}`} className="font-medium text-ink hover:underline">{s.part.maker} {s.part.model}</Link><span className="ml-2 text-xs text-muted">{KIND_LABELS[s.part.kind] ?? s.part.kind}</span></td>
                  <td className="num px-3 py-2 text-right font-semibold text-ink">{s.completes}</td>
                  <td className="num px-3 py-2 text-right text-muted">{s.needed}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="border-t border-line px-3 py-2 text-xs text-muted">&ldquo;Plans answered&rdquo; counts the plans that become answerable once this part and the ones above it are in stock. Plans are recorded without any name or account.</p>
        </div>
      ) : <p className="rounded-lg border border-line bg-surface p-5 text-muted">Nothing to suggest yet: every plan made with your stock in the last {next.days} days was answered, or none was made.</p>}
    </>
  );
}
