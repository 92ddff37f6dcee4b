"use client";
// The shop's stock as an editable table (TanStack Table): edit cells in place, then save every
// changed line in one PUT. Lines are checked with the same zod schema the API uses.
import Link from "next/link";
import { useMemo, useState } from "react";
import { createColumnHelper, flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/field";
import { PartCombobox } from "@/components/planner/part-combobox";
import { ApiError, fetchJson } from "@/components/api-client";
import { KIND_LABELS } from "@/lib/format";
import { formatMoney, minorDigits } from "@/lib/shops/money";
import { inventoryItemSchema } from "@/lib/validation/shops";

export type InventoryLine = {
  partId: string; slug: string; maker: string; model: string; kind: string;
  sku: string; priceCents: number; currency: string; onHand: number; reserved: number;
};
type Draft = { sku: string; price: string; currency: string; onHand: string };
type Row = InventoryLine & { draft: Draft; isNew?: boolean };

const toDraft = (l: InventoryLine): Draft => ({ sku: l.sku, price: (l.priceCents / 10 ** minorDigits(l.currency)).toFixed(minorDigits(l.currency)), currency: l.currency, onHand: String(l.onHand) });
const cell = "w-full rounded border border-transparent bg-transparent px-1.5 py-1 text-sm hover:border-line focus:border-brass focus:bg-surface focus:outline-none aria-[invalid=true]:border-bad";

function toItem(r: Row) {
  const currency = r.draft.currency.trim().toUpperCase();
  const digits = /^[A-Z]{3}$/.test(currency) ? (() => { try { return minorDigits(currency); } catch { return 2; } })() : 2;
  const price = r.draft.price.trim() === "" ? Number.NaN : Math.round(Number(r.draft.price) * 10 ** digits);
  return inventoryItemSchema.safeParse({ part: r.slug, sku: r.draft.sku, priceCents: price, currency, onHand: r.draft.onHand.trim() === "" ? Number.NaN : Number(r.draft.onHand) });
}

const changed = (r: Row) => r.isNew || JSON.stringify(r.draft) !== JSON.stringify(toDraft(r));

export function InventoryTable({ shopSlug, currency, initial }: { shopSlug: string; currency: string; initial: InventoryLine[] }) {
  const [base, setBase] = useState<InventoryLine[]>(initial);
  const [rows, setRows] = useState<Row[]>(() => initial.map((l) => ({ ...l, draft: toDraft(l) })));
  const [removed, setRemoved] = useState<string[]>([]);
  const [serverErrors, setServerErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<{ tone: "ok" | "bad"; text: string } | null>(null);
  const [saving, setSaving] = useState(false);
  const [sorting, setSorting] = useState<SortingState>([]);
  const [filter, setFilter] = useState("");

  const edit = (slug: string, patch: Partial<Draft>) => setRows((rs) => rs.map((r) => (r.slug === slug ? { ...r, draft: { ...r.draft, ...patch } } : r)));
  const dirty = rows.filter(changed);
  const checks = useMemo(() => new Map(rows.map((r) => [r.slug, toItem(r)])), [rows]);
  const errorsOf = (slug: string, field: string) => {
    const c = checks.get(slug);
    const local = c && !c.success ? c.error.issues.filter((i) => i.path[0] === field).map((i) => i.message) : [];
    return [...local, ...(serverErrors[`${slug}.${field}`] ?? [])];
  };

  const h = createColumnHelper<Row>();
  // biome-ignore lint/correctness/useExhaustiveDependencies: cells read the latest state through closures; rebuilt only when checks or server errors change
  const columns = useMemo(() => [
    h.accessor((r) => `${r.maker} ${r.model}`, {
      id: "part", header: "Catalog part",
      cell: ({ row: { original: r } }) => (
        <div className="min-w-[14rem]">
          <Link href={`/parts/${r.slug}`} className="font-medium text-ink hover:underline">{r.maker} {r.model}</Link>
          <div className="text-xs text-muted">{KIND_LABELS[r.kind] ?? r.kind}{r.isNew ? " · new line" : ""}</div>
        </div>
      ),
    }),
    ...(["sku", "price", "currency", "onHand"] as const).map((field) => h.accessor((r) => (field === "price" ? r.priceCents : field === "onHand" ? r.onHand : r[field]), {
      id: field, header: { sku: "SKU", price: "Price", currency: "Cur.", onHand: "On hand" }[field],
      cell: ({ row: { original: r } }) => {
        const zodField = field === "price" ? "priceCents" : field;
        const errs = errorsOf(r.slug, zodField);
        const id = `${r.slug}-${field}`;
        return (
          <div className={field === "sku" ? "min-w-[7rem]" : field === "currency" ? "w-16" : "w-24"}>
            <input id={id} aria-label={`${field === "onHand" ? "On hand" : field === "sku" ? "SKU" : field[0].toUpperCase() + field.slice(1)} of ${r.maker} ${r.model}`}
              className={`${cell} ${field === "sku" || field === "currency" ? "code" : "num text-right"}`} value={r.draft[field]} inputMode={field === "price" ? "decimal" : field === "onHand" ? "numeric" : undefined}
              aria-invalid={errs.length > 0 || undefined} aria-describedby={errs.length ? `${id}-err` : undefined}
              onChange={(e) => edit(r.slug, { [field]: e.target.value })} />
            {errs.length ? <p id={`${id}-err`} className="mt-0.5 text-xs text-bad">{errs[0]}</p> : null}
          </div>
        );
      },
    })),
    h.accessor("reserved", { header: "Reserved", cell: (c) => <span className="num block text-right text-muted">{c.getValue()}</span> }),
    h.accessor((r) => r.onHand - r.reserved, {
      id: "available", header: "Available",
      cell: ({ row: { original: r } }) => { const a = (Number(r.draft.onHand) || 0) - r.reserved; return <span className={`num block text-right font-medium ${a > 0 ? "text-ok" : "text-bad"}`}>{a > 0 ? a : "sold out"}</span>; },
    }),
    h.display({
      id: "actions", header: () => <span className="sr-only">Actions</span>,
      cell: ({ row: { original: r } }) => (
        <button type="button" className="rounded px-2 py-1 text-xs text-muted hover:bg-bad/10 hover:text-bad disabled:opacity-40" disabled={r.reserved > 0}
          title={r.reserved > 0 ? "Reserved for an order: cannot be removed" : "Remove this line"}
          onClick={() => { setRows((rs) => rs.filter((x) => x.slug !== r.slug)); if (!r.isNew) setRemoved((d) => [...d, r.slug]); }}>Remove</button>
      ),
    }),
  ], [checks, serverErrors]);

  const shown = useMemo(() => {
    const q = filter.trim().toLowerCase();
    return q ? rows.filter((r) => `${r.maker} ${r.model} ${r.sku} ${r.slug}`.toLowerCase().includes(q)) : rows;
  }, [rows, filter]);
  const table = useReactTable({ data: shown, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel(), getRowId: (r) => r.slug });

  async function save() {
    setMessage(null);
    const items = [];
    for (const r of dirty) {
      const c = checks.get(r.slug)!;
      if (!c.success) { setMessage({ tone: "bad", text: `Fix the marked cells of ${r.maker} ${r.model} first; nothing was saved.` }); return; }
      items.push(c.data);
    }
    setSaving(true);
    try {
      const res = await fetchJson<{ items: InventoryLine[]; written: number; removed: number }>(`/api/v1/shops/${shopSlug}/inventory`, {
        method: "PUT", headers: { "content-type": "application/json" }, body: JSON.stringify({ items, remove: removed }),
      });
      setBase(res.items);
      setRows(res.items.map((l) => ({ ...l, draft: toDraft(l) })));
      setRemoved([]); setServerErrors({});
      setMessage({ tone: "ok", text: `Saved: ${res.written} line${res.written === 1 ? "" : "s"} written${res.removed ? `, ${res.removed} removed` : ""}.` });
    } catch (err) {
      const fields = err instanceof ApiError ? err.fields ?? {} : {};
      const mapped: Record<string, string[]> = {};
      for (const [k, v] of Object.entries(fields)) {
        const m = k.match(/^items\.(\d+)\.(\w+)$/);
        if (m) mapped[`${items[Number(m[1])]?.part}.${m[2]}`] = v;
      }
      setServerErrors(mapped);
      setMessage({ tone: "bad", text: `${(err as Error).message} Nothing was saved.` });
    } finally { setSaving(false); }
  }

  function addLine(p: { slug: string; maker: string; model: string; kind: string; id: string; listPriceCents: number | null }) {
    if (rows.some((r) => r.slug === p.slug)) { setMessage({ tone: "bad", text: `${p.maker} ${p.model} is already a line.` }); return; }
    const line: InventoryLine = { partId: p.id, slug: p.slug, maker: p.maker, model: p.model, kind: p.kind, sku: "", priceCents: p.listPriceCents ?? 0, currency, onHand: 0, reserved: 0 };
    setRows((rs) => [{ ...line, draft: { ...toDraft(line), sku: "", onHand: "" }, isNew: true }, ...rs]);
    setRemoved((d) => d.filter((s) => s !== p.slug));
  }

  function reset() {
    setRows(base.map((l) => ({ ...l, draft: toDraft(l) })));
    setRemoved([]); setServerErrors({}); setMessage(null);
  }

  const pending = dirty.length + removed.length;
  return (
    <div className="space-y-4">
      <div className="grid gap-3 rounded-lg border border-line bg-surface p-4 md:grid-cols-[1fr_auto] md:items-start">
        <div>
        <p aria-hidden className="mb-1.5 text-sm font-medium text-text">Add a catalog part</p>
        <PartCombobox label="Add a catalog part" kinds={["adapter", "spacer", "extension"]} placeholder="Search spacers, adapters, extensions…"
          onPick={addLine} hint="It joins the table as a new line: give it your SKU, price and stock, then save." />
        </div>
        <label className="text-sm">
          <span className="mb-1.5 block font-medium text-text">Find a line</span>
          <input className="w-full rounded-md border border-line bg-bg px-3 py-2 text-sm md:w-56" value={filter} onChange={(e) => setFilter(e.target.value)} placeholder="Name, SKU…" />
        </label>
      </div>
      <div className="sticky top-0 z-10 flex flex-wrap items-center justify-between gap-3 rounded-lg border border-line bg-bg/95 px-4 py-2 backdrop-blur">
        <p className="text-sm text-muted" role="status">{pending ? `${pending} unsaved change${pending === 1 ? "" : "s"}` : `${rows.length} lines · your prices in ${currency}`}</p>
        <div className="flex gap-2">
          <Button variant="secondary" disabled={!pending || saving} onClick={reset}>Undo changes</Button>
          <Button disabled={!pending || saving} onClick={save}>{saving ? "Saving…" : "Save changes"}</Button>
        </div>
      </div>
      {message ? <FormMessage tone={message.tone}>{message.text}</FormMessage> : null}
      <div className="overflow-x-auto rounded-lg border border-line bg-surface">
        <table className="w-full min-w-[52rem] text-sm">
          <caption className="sr-only">Stock lines of the shop</caption>
          <thead className="border-b border-line bg-sunken text-left text-xs uppercase tracking-wide text-muted">
            {table.getHeaderGroups().map((g) => (
              <tr key={g.id}>{g.headers.map((hd) => (
                <th key={hd.id} scope="col" className={`px-3 py-2 font-medium ${["price", "onHand", "reserved", "available"].includes(hd.id) ? "text-right" : ""}`}
                  aria-sort={hd.column.getIsSorted() === "asc" ? "ascending" : hd.column.getIsSorted() === "desc" ? "descending" : undefined}>
                  {hd.column.getCanSort() && hd.id !== "actions" ? (
                    <button type="button" className="uppercase tracking-wide hover:text-ink" onClick={hd.column.getToggleSortingHandler()}>
                      {flexRender(hd.column.columnDef.header, hd.getContext())}{hd.column.getIsSorted() === "asc" ? " ↑" : hd.column.getIsSorted() === "desc" ? " ↓" : ""}
                    </button>
                  ) : flexRender(hd.column.columnDef.header, hd.getContext())}
                </th>
              ))}</tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className={`border-b border-line/60 align-middle last:border-0 ${changed(row.original) ? "bg-brass/5" : ""}`}>
                {row.getVisibleCells().map((c) => <td key={c.id} className="px-3 py-1.5">{flexRender(c.column.columnDef.cell, c.getContext())}</td>)}
              </tr>
            ))}
            {!shown.length ? <tr><td colSpan={8} className="px-3 py-6 text-center text-muted">{rows.length ? "No line matches." : "No stock yet: add a part above or import a CSV."}</td></tr> : null}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-muted">Price examples: {formatMoney(8250, currency)} is typed as {(8250 / 10 ** minorDigits(currency)).toFixed(minorDigits(currency))}. Reserved units belong to checkouts in progress; they change only through orders.</p>
    </div>
  );
}
