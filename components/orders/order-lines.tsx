import Link from "next/link";
import { listAnd } from "@/lib/format";
import { formatMoney } from "@/lib/payments/money";
import type { QuoteJson } from "@/lib/payments/to-json";
import { rowClass, Table, type TableColumn } from "@/components/ui/table";

/** The quote's lines with the server's totals; with `stock`, the shop's shelf count beside each. */
export function OrderLines({ quote, stock = false }: { quote: QuoteJson; stock?: boolean }) {
  const money = (n: number) => formatMoney(n, quote.currency);
  const shown = quote.lines.filter((l) => l.quantity > 0 || quote.status === "requested");
  const dropped = quote.lines.filter((l) => l.quantity === 0 && quote.status !== "requested");
  const columns: TableColumn[] = [
    { label: "Part" }, { label: "SKU", wide: true }, ...(stock ? [{ label: "On shelf", right: true }] : []),
    { label: "Qty", right: true }, { label: "Unit", right: true, wide: true }, { label: "Amount", right: true },
  ];
  return (
    <Table columns={columns} caption="Parts in this quote"
      after={dropped.length ? <p className="border-t border-line px-4 py-2 text-xs text-muted">Left out by the shop: {listAnd(dropped.map((l) => l.name))}.</p> : null}>
        <tbody>
          {shown.map((l) => (
            <tr key={l.id} className={rowClass}>
              <td className="px-4 py-2.5"><Link href={`/parts/${l.partSlug}`} className="font-medium text-ink underline-offset-4 hover:underline">{l.name}</Link>
                <div className="text-xs text-muted"><span className="code sm:hidden">{l.sku} · {money(l.unitPriceCents)} each</span>{l.quantity !== l.requestedQuantity ? <span className="block">asked for {l.requestedQuantity}</span> : null}</div></td>
              <td className="code hidden px-3 py-2.5 text-muted sm:table-cell">{l.sku}</td>
              {stock ? <td className="num px-3 py-2.5 text-right">{l.onHand ?? "—"}{l.reserved ? <span className="text-xs text-muted"> ({l.reserved} held)</span> : null}</td> : null}
              <td className="num px-3 py-2.5 text-right">{l.quantity}</td>
              <td className="num hidden px-3 py-2.5 text-right sm:table-cell">{money(l.unitPriceCents)}</td>
              <td className="num px-4 py-2.5 text-right">{money(l.quantity * l.unitPriceCents)}</td>
            </tr>
          ))}
        </tbody>
        <tfoot className="border-t border-line bg-sunken/60">
          <tr><FootLabel stock={stock} className="py-2 font-normal text-muted">Shipping</FootLabel><td className="num px-4 py-2 text-right">{quote.status === "requested" ? "—" : money(quote.shippingCents)}</td></tr>
          <tr><FootLabel stock={stock} className="py-2.5 font-semibold">{quote.status === "requested" ? "At the shop's listed prices, before its answer" : "Total"}</FootLabel>
            <td className="num px-4 py-2.5 text-right text-base font-semibold" data-testid="quote-total">{money(quote.totalCents)}</td></tr>
        </tfoot>
    </Table>
  );
}

/** A footer label spanning the columns shown: SKU and unit price fold into the part cell on a phone. */
function FootLabel({ stock, className, children }: { stock: boolean; className: string; children: React.ReactNode }) {
  return (
    <>
      <th scope="row" colSpan={stock ? 5 : 4} className={`hidden px-4 text-left sm:table-cell ${className}`}>{children}</th>
      <th scope="row" colSpan={stock ? 3 : 2} className={`px-4 text-left sm:hidden ${className}`}>{children}</th>
    </>
  );
}

/** Sky to sensor, by name: the train these parts are for. */
export function TrainLine({ quote }: { quote: QuoteJson }) {
  return (
    <ol className="flex flex-wrap items-center gap-x-1.5 gap-y-1 text-sm">
      {quote.train.map((t, i) => (
        <li key={i} className="flex items-center gap-1.5">
          <span className={`rounded border px-1.5 py-0.5 ${t.role === "connector" ? "border-brass/50 bg-brass/10 text-brass-ink" : t.role === "optics" || t.role === "telescope" ? "border-glass/50 bg-glass/10 text-glass-ink" : "border-line bg-station text-text"}`}>{t.name}</span>
          {i < quote.train.length - 1 ? <span aria-hidden className="text-muted">→</span> : null}
        </li>
      ))}
    </ol>
  );
}
