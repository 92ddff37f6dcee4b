"use client";
// Upload a stock CSV, see each row matched to a catalog part (or its error), then confirm:
// the server applies every row in one transaction, or none.
import Link from "next/link";
import { useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/field";
import { ApiError, fetchJson } from "@/components/api-client";
import type { Preview } from "@/lib/shops/csv";
import { formatMoney } from "@/lib/shops/money";
import { LIMITS } from "@/lib/validation/shops";

type Answer = Preview & { applied: boolean };
const MB = LIMITS.importBytes / 1024 / 1024;

export function CsvImport({ shopSlug }: { shopSlug: string }) {
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<Answer | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function send(f: File, confirm: boolean) {
    setBusy(true); setError(null); setDone(null);
    try {
      if (f.size > LIMITS.importBytes) throw new Error(`The file is larger than ${MB} MB; split it and import the parts one after the other.`);
      const res = await fetchJson<Answer>(`/api/v1/shops/${shopSlug}/inventory/import${confirm ? "?confirm=1" : ""}`, {
        method: "POST", headers: { "content-type": "text/csv" }, body: f,
      });
      setPreview(res);
      if (res.applied) setDone(`Imported ${res.rows.length} line${res.rows.length === 1 ? "" : "s"}: ${res.rows.filter((r) => r.action === "add").length} added, ${res.rows.filter((r) => r.action === "update").length} updated.`);
    } catch (err) {
      if (err instanceof ApiError && err.status === 400 && !confirm) setPreview(null);
      setError((err as Error).message);
    } finally { setBusy(false); }
  }

  const rows = preview?.rows ?? [];
  return (
    <div className="space-y-4">
      <div className="rounded-lg border border-dashed border-line bg-surface p-5">
        <label htmlFor="csv-file" className="block font-medium text-ink">Stock file (CSV, UTF-8, up to {MB} MB)</label>
        <p className="mt-1 text-sm text-muted">
          Columns: <span className="code">catalog_slug</span> (or <span className="code">maker</span> and <span className="code">model</span>), <span className="code">sku</span>, <span className="code">price_cents</span> (a whole number in the smallest unit), <span className="code">currency</span> (ISO 4217), <span className="code">on_hand</span>.
          The <a href={`/api/v1/shops/${shopSlug}/inventory/export`} className="underline decoration-brass underline-offset-2">export</a> is a ready-made template.
        </p>
        <div className="mt-3 flex flex-wrap items-center gap-3">
          <input ref={input} id="csv-file" type="file" accept=".csv,text/csv" className="text-sm file:mr-3 file:rounded-md file:border file:border-line file:bg-bg file:px-3 file:py-1.5 file:text-sm"
            onChange={(e) => { const f = e.target.files?.[0] ?? null; setFile(f); setPreview(null); setDone(null); if (f) void send(f, false); }} />
          {busy ? <span className="text-sm text-muted" role="status">Checking…</span> : null}
        </div>
      </div>
      {error ? <FormMessage>{error} Nothing was imported.</FormMessage> : null}
      {done ? <FormMessage tone="ok">{done} <Link href="/shop/inventory" className="underline">See the inventory</Link></FormMessage> : null}
      {preview && !preview.applied ? (
        <section aria-labelledby="preview-title" className="space-y-3">
          <div className="flex flex-wrap items-end justify-between gap-3">
            <div>
              <h2 id="preview-title" className="text-lg font-semibold text-ink">Preview: nothing is written yet</h2>
              <p className="text-sm text-muted"><span className="num font-medium text-ok">{preview.okCount} ready</span>{preview.errorCount ? <> · <span className="num font-medium text-bad">{preview.errorCount} to fix</span>: fix them in the file and upload it again. A file with any wrong row imports nothing.</> : " · every row matched a catalog part."}</p>
            </div>
            <Button disabled={busy || preview.errorCount > 0 || !file} onClick={() => file && send(file, true)}>{preview.errorCount ? `Fix ${preview.errorCount} row${preview.errorCount === 1 ? "" : "s"} to import` : `Import ${preview.okCount} line${preview.okCount === 1 ? "" : "s"}`}</Button>
          </div>
          <div className="overflow-x-auto rounded-lg border border-line bg-surface">
            <table className="w-full min-w-[44rem] text-sm">
              <caption className="sr-only">Rows of the file, matched to catalog parts</caption>
              <thead className="border-b border-line bg-sunken text-left text-xs uppercase tracking-wide text-muted">
                <tr><th className="px-3 py-2">Line</th><th className="px-3 py-2">Catalog part</th><th className="px-3 py-2">SKU</th><th className="px-3 py-2 text-right">Price</th><th className="px-3 py-2 text-right">On hand</th><th className="px-3 py-2">Result</th></tr>
              </thead>
              <tbody>
                {rows.map((r) => (
                  <tr key={r.line} className={`border-b border-line/60 align-top last:border-0 ${r.errors.length ? "bg-bad/5" : ""}`}>
                    <td className="num px-3 py-2 text-muted">{r.line}</td>
                    <td className="px-3 py-2">{r.part ? <Link href={`/parts/${r.part.slug}`} className="text-ink hover:underline">{r.part.name}</Link> : <span className="text-muted">not matched</span>}</td>
                    <td className="code whitespace-nowrap px-3 py-2">{r.sku || "—"}</td>
                    <td className="num px-3 py-2 text-right">{r.priceCents !== null && r.currency.length === 3 ? (() => { try { return formatMoney(r.priceCents, r.currency); } catch { return r.priceCents; } })() : "—"}</td>
                    <td className="num px-3 py-2 text-right">{r.onHand ?? "—"}</td>
                    <td className="px-3 py-2">{r.errors.length ? <ul className="space-y-0.5 text-bad">{r.errors.map((e) => <li key={e}>{e}</li>)}</ul> : <span className="rounded bg-ok/10 px-1.5 py-0.5 text-xs font-medium text-ok">{r.action === "add" ? "new line" : "update"}</span>}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </section>
      ) : null}
    </div>
  );
}
