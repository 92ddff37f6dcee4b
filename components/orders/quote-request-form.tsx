"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { callApi } from "@/components/api-client";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, inputClass } from "@/components/ui/field";
import { formatMoney } from "@/lib/payments/money";

export type ShopOffer = {
  slug: string; name: string; location: string | null; currency: string; subtotalCents: number; stockedCount: number; shortCount: number;
  lines: { name: string; count: number; sku: string | null; priceCents: number | null; available: number | null }[];
};

/** Choose a shop (each shows what it stocks of the parts to buy), add a note, send. */
export function QuoteRequestForm({ build, offers, neededCount }: { build: string; offers: ShopOffer[]; neededCount: number }) {
  const router = useRouter();
  const [shop, setShop] = useState(offers[0]?.slug ?? "");
  const [note, setNote] = useState("");
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ message: string; fields?: Record<string, string[]> } | null>(null);

  async function send(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true); setError(null);
    const res = await callApi<{ id: string }>("POST", "/api/v1/quotes", { build, shop, note: note.trim() || undefined });
    if (!res.ok) { setBusy(false); setError({ message: res.message, fields: res.fields }); return; }
    router.push(`/quotes/${res.data.id}?sent=1`);
  }

  return (
    <form onSubmit={send} className="space-y-5" noValidate>
      {error ? <FormMessage>{error.message}</FormMessage> : null}
      <fieldset className="space-y-3">
        <legend className="mb-2 text-sm font-medium text-text">Ask which shop</legend>
        {offers.map((o) => (
          <label key={o.slug} className={`block cursor-pointer rounded-lg border bg-surface p-4 transition-colors ${shop === o.slug ? "border-brass shadow-[inset_3px_0_0_var(--c-brass)]" : "border-line hover:border-brass/60"}`}>
            <div className="flex flex-wrap items-start justify-between gap-3">
              <span className="flex items-start gap-3">
                <input type="radio" name="shop" value={o.slug} checked={shop === o.slug} onChange={() => setShop(o.slug)} className="mt-1 accent-[var(--c-brass)]" />
                <span>
                  <span className="block font-semibold text-ink">{o.name}</span>
                  {o.location ? <span className="block text-xs text-muted">{o.location}</span> : null}
                </span>
              </span>
              <span className="text-right text-sm">
                <span className="num block font-semibold text-ink">{formatMoney(o.subtotalCents, o.currency)}</span>
                <span className="block text-xs text-muted">stocks {o.stockedCount} of {neededCount} part{neededCount === 1 ? "" : "s"}{o.shortCount ? ` · ${o.shortCount} short on the shelf` : ""}</span>
              </span>
            </div>
            <ul className="mt-3 space-y-1 border-t border-line/70 pt-2 text-xs">
              {o.lines.map((l) => (
                <li key={l.name} className="flex justify-between gap-2">
                  <span className={l.sku ? "text-text" : "text-muted line-through decoration-muted/60"}>{l.count} × {l.name}</span>
                  <span className="num whitespace-nowrap text-muted">{l.sku ? `${formatMoney(l.priceCents, o.currency)} · ${l.available} on shelf` : "not stocked"}</span>
                </li>
              ))}
            </ul>
          </label>
        ))}
        {error?.fields?.shop ? <p role="alert" className="text-sm text-bad">{error.fields.shop[0]}</p> : null}
      </fieldset>
      <Field label="Note to the shop (optional)" htmlFor="quote-note" error={error?.fields?.note?.[0]} hint="Delivery address region, a deadline, a substitute you would accept…">
        <textarea id="quote-note" rows={3} maxLength={2000} className={inputClass} value={note} onChange={(e) => setNote(e.target.value)} />
      </Field>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={busy || !shop}>{busy ? "Sending…" : "Send the quote request"}</Button>
        <p className="text-xs text-muted">Nothing is charged or reserved yet: the shop answers with prices and shipping first.</p>
      </div>
    </form>
  );
}
