import Link from "next/link";
import { InterfaceChip } from "@/components/parts/interface-chip";
import { toBuyTotalCents, type ShoppingLine } from "@/lib/builds/chain";
import { KIND_LABELS, formatPrice } from "@/lib/format";
import { formatMm } from "@/lib/units";

const ROLE_LABEL: Record<ShoppingLine["role"], string> = {
  telescope: "Telescope", optics: "Optics", station: "Device", connector: "Connecting part", camera: "Camera",
};

function Status({ line }: { line: ShoppingLine }) {
  if (line.item.owned) return <span className="rounded bg-ok/10 px-1.5 py-0.5 text-xs text-ok">owned</span>;
  if (line.toBuy) return <span className="rounded bg-brass/15 px-1.5 py-0.5 text-xs font-medium text-brass-ink">to buy</span>;
  return <span className="text-xs text-muted">chosen</span>;
}

/** Sky to sensor: every item of the build, with the connecting parts to buy and what they cost. */
export function PartsList({ lines }: { lines: ShoppingLine[] }) {
  const toBuy = lines.filter((l) => l.toBuy);
  const total = toBuyTotalCents(lines);
  const summary = toBuy.length
    ? `To buy: ${toBuy.reduce((n, l) => n + l.count, 0)} connecting part${toBuy.reduce((n, l) => n + l.count, 0) === 1 ? "" : "s"}`
    : "Nothing to buy: every connecting part is owned";
  const totalText = toBuy.length ? (total === null ? "price unknown" : formatPrice(total)) : "0.00";
  return (
    <>
    <ul className="divide-y divide-line/70 rounded-lg border border-line bg-surface text-sm sm:hidden">
      {lines.map((l) => (
        <li key={`${l.role}:${l.id}`} className={`space-y-1.5 px-4 py-3 ${l.toBuy ? "bg-brass/5" : ""}`}>
          <div className="flex items-start justify-between gap-3">
            <div>
              <div className="text-xs text-muted">{ROLE_LABEL[l.role]}</div>
              <Link href={`/parts/${l.item.slug}`} className="font-medium text-ink underline-offset-4 hover:underline">{l.item.name}</Link>
            </div>
            <Status line={l} />
          </div>
          <div className="flex flex-wrap items-center gap-x-2 gap-y-1">
            {l.item.front ? <InterfaceChip code={l.item.front.interface} gender={l.item.front.gender} /> : <span className="text-muted">—</span>}
            <span aria-hidden className="text-muted">→</span>
            {l.item.rear ? <InterfaceChip code={l.item.rear.interface} gender={l.item.rear.gender} /> : <span className="text-muted">—</span>}
          </div>
          <div className="num flex gap-4 text-xs text-muted">
            {l.role === "telescope" || l.role === "optics" ? null : <span>{formatMm(l.item.lengthMm)}</span>}
            {l.count > 1 ? <span>× {l.count}</span> : null}
            {l.role === "connector" && !l.item.owned ? <span>{formatPrice(l.unitPriceCents === null ? null : l.unitPriceCents * l.count)}</span> : null}
          </div>
        </li>
      ))}
      <li className="flex justify-between bg-sunken/60 px-4 py-2.5 font-medium"><span>{summary}</span><span className="num">{totalText}</span></li>
    </ul>
    <div className="relative hidden overflow-x-auto rounded-lg border border-line bg-surface sm:block">
      <table className="w-full min-w-[640px] text-sm">
        <caption className="sr-only">Parts of this build, sky to sensor</caption>
        <thead className="border-b border-line text-left text-xs uppercase tracking-wide text-muted">
          <tr>
            <th scope="col" className="px-4 py-2 font-medium">Part</th>
            <th scope="col" className="px-3 py-2 font-medium">Sky side → sensor side</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Length</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Qty</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Price</th>
            <th scope="col" className="px-4 py-2 font-medium"><span className="sr-only">Status</span></th>
          </tr>
        </thead>
        <tbody>
          {lines.map((l) => (
            <tr key={`${l.role}:${l.id}`} className={`border-b border-line/70 last:border-0 ${l.toBuy ? "bg-brass/5" : ""}`}>
              <td className="px-4 py-2.5">
                <div className="text-xs text-muted">{ROLE_LABEL[l.role]}{l.role !== "connector" && KIND_LABELS[l.item.kind] && l.role === "station" ? ` · ${KIND_LABELS[l.item.kind]}` : ""}</div>
                <Link href={`/parts/${l.item.slug}`} className="font-medium text-ink underline-offset-4 hover:underline">{l.item.name}</Link>
              </td>
              <td className="px-3 py-2.5">
                <span className="inline-flex flex-wrap items-center gap-x-2 gap-y-1">
                  {l.item.front ? <InterfaceChip code={l.item.front.interface} gender={l.item.front.gender} /> : <span className="text-muted">—</span>}
                  <span aria-hidden className="text-muted">→</span>
                  {l.item.rear ? <InterfaceChip code={l.item.rear.interface} gender={l.item.rear.gender} /> : <span className="text-muted">—</span>}
                </span>
              </td>
              <td className="num px-3 py-2.5 text-right">{l.role === "telescope" || l.role === "optics" ? "—" : formatMm(l.item.lengthMm)}</td>
              <td className="num px-3 py-2.5 text-right">{l.count}</td>
              <td className="num px-3 py-2.5 text-right">{l.role === "connector" ? (l.item.owned ? "0.00" : formatPrice(l.unitPriceCents === null ? null : l.unitPriceCents * l.count)) : "—"}</td>
              <td className="px-4 py-2.5"><Status line={l} /></td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr className="border-t border-line bg-sunken/60">
            <th scope="row" colSpan={4} className="px-4 py-2.5 text-left font-medium">{summary}</th>
            <td className="num px-3 py-2.5 text-right font-semibold">{totalText}</td>
            <td className="px-4 py-2.5 text-xs text-muted">list prices</td>
          </tr>
        </tfoot>
      </table>
    </div>
    </>
  );
}
