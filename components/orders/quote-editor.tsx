"use client";
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { callApi } from "@/components/api-client";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input, inputClass } from "@/components/ui/field";
import { formatMoney, inputToMinor, minorToInput, quoteTotal } from "@/lib/payments/money";
import type { QuoteJson } from "@/lib/payments/to-json";

type Row = { id: string; name: string; sku: string; onHand: number | null; reserved: number | null; requested: number; quantity: string; price: string };

/** The shop's answer: quantity and unit price per line, shipping, a note, how long it holds. The server recomputes every sum. */
export function QuoteEditor({ quote }: { quote: QuoteJson }) {
  const router = useRouter();
  const c = quote.currency;
  const [rows, setRows] = useState<Row[]>(quote.lines.map((l) => ({
    id: l.id, name: l.name, sku: l.sku, onHand: l.onHand ?? null, reserved: l.reserved ?? null, requested: l.requestedQuantity,
    quantity: String(l.quantity), price: minorToInput(l.unitPriceCents, c),
  })));
  const [shipping, setShipping] = useState(minorToInput(quote.shippingCents, c));
  const [note, setNote] = useState(quote.shopNote ?? "");
  const [days, setDays] = useState(String(quote.validDays ?? 14));
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ tone: "bad" | "ok"; text: string } | null>(null);
  const [fields, setFields] = useState<Record<string, string[]>>({});

  const parsed = rows.map((r) => ({ quantity: /^\d{1,2}$/.test(r.quantity.trim()) ? Number(r.quantity) : NaN, unitPriceCents: inputToMinor(r.price, c) }));
  const shippingMinor = inputToMinor(shipping, c);
  const total = useMemo(() => (parsed.every((p) => Number.isFinite(p.quantity) && p.unitPriceCents !== null) && shippingMinor !== null
    ? quoteTotal(parsed.map((p) => ({ quantity: p.quantity, unitPriceCents: p.unitPriceCents! })), shippingMinor) : null), [parsed, shippingMinor]);

  const set = (i: number, patch: Partial<Row>) => setRows(rows.map((r, j) => (j === i ? { ...r, ...patch } : r)));

  async function send(e: React.FormEvent) {
    e.preventDefault();
    setMessage(null); setFields({});
    const local: Record<string, string[]> = {};
    parsed.forEach((p, i) => {
      if (!Number.isFinite(p.quantity)) local[`lines.${i}.quantity`] = ["A whole number, 0 to 99"];
      if (p.unitPriceCents === null) local[`lines.${i}.unitPriceCents`] = ["A price like 12.50"];
    });
    if (shippingMinor === null) local.shippingCents = ["A price like 8.00 (0 for free)"];
    if (Object.keys(local).length) { setFields(local); setMessage({ tone: "bad", text: "Some fields need attention." }); return; }
    setBusy(true);
    const res = await callApi("POST", `/api/v1/quotes/${quote.id}/answer`, {
      lines: rows.map((r, i) => ({ id: r.id, quantity: parsed[i].quantity, unitPriceCents: parsed[i].unitPriceCents })),
      shippingCents: shippingMinor, note: note.trim() || undefined, validDays: Number(days),
    });
    setBusy(false);
    if (!res.ok) { setMessage({ tone: "bad", text: res.message }); setFields(res.fields ?? {}); return; }
    setMessage({ tone: "ok", text: "Quote sent. The buyer has an e-mail with a link to pay." });
    router.refresh();
  }

  const err = (k: string) => fields[k]?.[0];
  return (
    <form onSubmit={send} className="space-y-5" noValidate aria-label="Your quote">
      {message ? <FormMessage tone={message.tone}>{message.text}</FormMessage> : null}
      <div className="overflow-x-auto rounded-lg border border-line bg-surface">
        <table className="w-full min-w-[640px] text-sm">
          <thead className="whitespace-nowrap border-b border-line text-left text-xs uppercase tracking-wide text-muted">
            <tr>
              <th scope="col" className="px-4 py-2 font-medium">Part</th>
              <th scope="col" className="px-3 py-2 text-right font-medium">On shelf</th>
              <th scope="col" className="px-3 py-2 text-right font-medium">Asked</th>
              <th scope="col" className="px-3 py-2 font-medium">Quote qty</th>
              <th scope="col" className="px-3 py-2 font-medium">Unit price ({c})</th>
              <th scope="col" className="px-4 py-2 text-right font-medium">Amount</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r, i) => {
              const free = r.onHand === null ? null : r.onHand - (r.reserved ?? 0);
              const short = free !== null && Number.isFinite(parsed[i].quantity) && parsed[i].quantity > free;
              return (
                <tr key={r.id} className="border-b border-line/70 align-top last:border-0">
                  <td className="px-4 py-2.5"><div className="font-medium text-ink">{r.name}</div><div className="code text-xs text-muted">{r.sku}</div></td>
                  <td className={`num px-3 py-2.5 text-right ${short ? "font-semibold text-bad" : ""}`}>{free ?? "—"}{short ? <div className="text-xs font-normal">short</div> : null}</td>
                  <td className="num px-3 py-2.5 text-right text-muted">{r.requested}</td>
                  <td className="px-3 py-2">
                    <Input aria-label={`Quantity of ${r.name}`} inputMode="numeric" className="num max-w-[5rem]" value={r.quantity} invalid={!!err(`lines.${i}.quantity`)} onChange={(e) => set(i, { quantity: e.target.value })} />
                    {err(`lines.${i}.quantity`) ? <p className="mt-1 text-xs text-bad">{err(`lines.${i}.quantity`)}</p> : null}
                  </td>
                  <td className="px-3 py-2">
                    <Input aria-label={`Unit price of ${r.name}`} inputMode="decimal" className="num max-w-[7.5rem]" value={r.price} invalid={!!err(`lines.${i}.unitPriceCents`)} onChange={(e) => set(i, { price: e.target.value })} />
                    {err(`lines.${i}.unitPriceCents`) ? <p className="mt-1 text-xs text-bad">{err(`lines.${i}.unitPriceCents`)}</p> : null}
                  </td>
                  <td className="num px-4 py-2.5 text-right">{Number.isFinite(parsed[i].quantity) && parsed[i].unitPriceCents !== null ? formatMoney(parsed[i].quantity * parsed[i].unitPriceCents!, c) : "—"}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {err("lines") ? <p role="alert" className="text-sm text-bad">{err("lines")}</p> : null}
      <p className="text-xs text-muted">A quantity of 0 leaves the part out. Stock is not held until the buyer accepts and pays.</p>
      <div className="grid gap-4 sm:grid-cols-[10rem_10rem_1fr]">
        <Field label={`Shipping (${c})`} htmlFor="q-shipping" error={err("shippingCents")}>
          <Input id="q-shipping" inputMode="decimal" className="num" value={shipping} invalid={!!err("shippingCents")} onChange={(e) => setShipping(e.target.value)} />
        </Field>
        <Field label="Valid for (days)" htmlFor="q-days" error={err("validDays")}>
          <Input id="q-days" type="number" min={1} max={60} className="num" value={days} invalid={!!err("validDays")} onChange={(e) => setDays(e.target.value)} />
        </Field>
        <div className="flex items-end justify-end">
          <div className="text-right"><div className="text-xs uppercase tracking-wide text-muted">Total the buyer pays</div><div className="num text-2xl font-semibold text-ink" data-testid="editor-total">{total === null ? "—" : formatMoney(total, c)}</div></div>
        </div>
      </div>
      <Field label="Note to the buyer (optional)" htmlFor="q-note" error={err("note")} hint="Lead time, a substitute, assembly advice…">
        <textarea id="q-note" rows={3} maxLength={2000} className={inputClass} value={note} onChange={(e) => setNote(e.target.value)} />
      </Field>
      <Button type="submit" disabled={busy}>{busy ? "Sending…" : quote.status === "quoted" ? "Send the revised quote" : "Send the quote"}</Button>
    </form>
  );
}
