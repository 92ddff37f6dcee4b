"use client";
// What to buy (connectors not owned, with list prices) and what you already own.
import Link from "next/link";
import { formatPrice } from "@/lib/format";
import { formatMoney } from "@/lib/shops/money";
import { formatLength, type LengthUnit } from "@/lib/units";
import type { MissingJoint } from "@/lib/planner/join-plan";
import type { Train } from "./train-model";

type Line = { id: string; slug: string; name: string; count: number; lengthMm: number; priceCents: number | null; owned: boolean };

export function shoppingLines(train: Train): Line[] {
  const lines = new Map<string, Line>();
  for (const it of train.items) {
    if (it.role !== "connector") continue;
    const prev = lines.get(it.itemId);
    if (prev) { prev.count++; continue; }
    lines.set(it.itemId, {
      id: it.itemId, slug: it.item?.slug ?? it.itemId.replace(/~owned$/, ""), name: it.name, count: 1,
      lengthMm: it.item?.lengthMm ?? it.lengthMm, priceCents: it.item?.priceCents ?? null, owned: !!it.item?.owned,
    });
  }
  return [...lines.values()];
}

function MissingLine({ missing, names }: { missing: MissingJoint; names: (id: string) => string }) {
  return (
    <p role="note" className="mb-3 rounded-md border border-bad/50 bg-bad/5 px-3 py-2 text-sm text-text">
      <strong className="text-bad">▲ Not a complete train:</strong> between the telescope and the corrector it needs {missing.needed ?? "an adapter"}
      {missing.adapterIds.length
        ? <>; the catalog has {missing.adapterIds.slice(0, 3).map((id, i) => <span key={id}>{i ? "; " : ""}<Link href={`/parts/${id}`} className="underline decoration-brass underline-offset-2">{names(id)}</Link></span>)}.</>
        : <> — there is none in the catalog, so this list cannot make the train work.</>}
    </p>
  );
}

export function PartsList({ train, unit, owned, currency, missing = null, names = (id) => id }: {
  train: Train; unit: LengthUnit; owned: boolean; currency?: string; missing?: MissingJoint | null; names?: (id: string) => string;
}) {
  // A shop's answer carries the shop's prices in its currency; otherwise catalog list prices.
  const price = (cents: number) => (currency ? formatMoney(cents, currency) : formatPrice(cents));
  const note = missing ? <MissingLine missing={missing} names={names} /> : null;
  const lines = shoppingLines(train);
  const buy = lines.filter((l) => !l.owned);
  const own = lines.filter((l) => l.owned);
  const known = buy.filter((l) => l.priceCents !== null);
  const total = known.reduce((s, l) => s + l.priceCents! * l.count, 0);
  const unknown = buy.length - known.length;
  if (!lines.length) return <>{note}<p className="text-sm text-muted">No connecting parts: your chosen parts join directly{missing ? " behind the corrector" : ""}.</p></>;
  return (
    <>{note}
    <div className="grid gap-4 md:grid-cols-2">
      <div>
        <h3 className="mb-1.5 text-xs font-semibold uppercase tracking-wide text-muted">To buy</h3>
        {buy.length ? (
          <table className="w-full text-sm">
            <caption className="sr-only">Parts to buy, at list prices</caption>
            <tbody className="num">
              {buy.map((l) => (
                <tr key={l.id} className="border-b border-line/70">
                  <td className="py-1.5 pr-2 align-top">{l.count > 1 ? `${l.count} × ` : ""}<Link href={`/parts/${l.slug}`} className="text-ink underline-offset-2 hover:underline">{l.name}</Link>
                    <span className="block text-xs text-muted">{formatLength(l.lengthMm, unit)}</span></td>
                  <td className="py-1.5 text-right align-top">{l.priceCents === null ? <span className="text-muted">price unknown</span> : price(l.priceCents * l.count)}</td>
                </tr>
              ))}
            </tbody>
            <tfoot className="num">
              <tr>
                <th scope="row" className="pt-2 text-left font-semibold text-ink">Total at {currency ? "the shop's prices" : "list prices"}{unknown ? ` (${unknown} unpriced)` : ""}</th>
                <td className="pt-2 text-right font-semibold text-ink">{known.length ? price(total) : "—"}</td>
              </tr>
            </tfoot>
          </table>
        ) : <p className="text-sm text-ok">Nothing: you own every connector this chain needs.</p>}
      </div>
      <div>
        <h3 className="mb-1.5 text-xs font-semibold uppercase tracking-wide text-muted">Already yours</h3>
        {own.length ? (
          <ul className="space-y-1 text-sm">
            {own.map((l) => <li key={l.id} className="flex justify-between gap-2 border-b border-line/70 py-1.5"><span>{l.count > 1 ? `${l.count} × ` : ""}{l.name}</span><span className="num text-muted">{formatLength(l.lengthMm, unit)}</span></li>)}
          </ul>
        ) : <p className="text-sm text-muted">{owned ? <>None of your own connectors fit this chain. <Link href="/account/gear" className="text-text underline decoration-brass underline-offset-2">Your parts list</Link></> : currency ? "Drawing from the shop’s stock only. Tick “Count what I own first” to use your own parts too." : "Drawing from the whole catalog. Choose “What I own, then the catalog” to count your own parts as free."}</p>}
      </div>
    </div>
    </>
  );
}
