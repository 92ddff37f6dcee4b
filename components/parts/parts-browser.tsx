"use client";
import { useInfiniteQuery } from "@tanstack/react-query";
import {
  createColumnHelper, flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState,
} from "@tanstack/react-table";
import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useMemo, useState } from "react";
import { useDebouncedCallback } from "use-debounce";
import type { ApiPart } from "@/lib/catalog/part-json";
import { KIND_LABELS, formatGrams } from "@/lib/format";
import { formatMm } from "@/lib/units";
import { INTERFACES, interfaceLabel } from "@/lib/interfaces";
import { PART_KINDS } from "@/lib/validation/parts";
import { fetchJson } from "@/components/api-client";
import { inputClass } from "@/components/ui/field";
import { InterfaceChip } from "./interface-chip";

type Page = { items: ApiPart[]; nextCursor: string | null };
const col = createColumnHelper<ApiPart>();

const columns = [
  col.accessor((p) => p.name, { id: "name", header: "Part", cell: (c) => (
    <Link href={`/parts/${c.row.original.slug}`} className="font-medium text-ink underline-offset-4 hover:underline">
      <span className="block text-xs font-normal text-muted">{c.row.original.maker}</span>{c.row.original.model}
    </Link>) }),
  col.accessor("kind", { header: "Kind", cell: (c) => KIND_LABELS[c.getValue()] ?? c.getValue() }),
  col.accessor((p) => p.front?.interface ?? "", { id: "front", header: "Sky side", cell: (c) => c.row.original.front ? <InterfaceChip code={c.row.original.front.interface} gender={c.row.original.front.gender} /> : <span className="text-muted">—</span> }),
  col.accessor((p) => p.rear?.interface ?? "", { id: "rear", header: "Sensor side", cell: (c) => c.row.original.rear ? <InterfaceChip code={c.row.original.rear.interface} gender={c.row.original.rear.gender} /> : <span className="text-muted">—</span> }),
  col.accessor("lengthMm", { header: "Length", cell: (c) => <span className="num">{formatMm(c.getValue())}{c.row.original.adjustMm ? <span className="text-muted"> +{c.row.original.adjustMm}</span> : null}</span> }),
  col.accessor("clearApertureMm", { header: "Clear aperture", cell: (c) => <span className="num">{formatMm(c.getValue())}</span> }),
  col.accessor("weightG", { header: "Weight", cell: (c) => <span className="num">{formatGrams(c.getValue())}</span> }),
];

export function PartsBrowser() {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const [q, setQ] = useState(params.get("q") ?? "");
  const kind = params.get("kind") ?? "";
  const iface = params.get("interface") ?? "";
  const [sorting, setSorting] = useState<SortingState>([]);

  // Three plain string parameters through Next's router; nuqs's adapter would load on every page (+3.8 KB gzip, measured).
  function setParam(name: string, value: string) {
    const next = new URLSearchParams(params.toString());
    if (value) next.set(name, value); else next.delete(name);
    router.replace(`${pathname}${next.size ? `?${next}` : ""}`, { scroll: false });
  }
  // The address follows the search box once typing pauses.
  const pushQ = useDebouncedCallback((value: string) => { if ((params.get("q") ?? "") !== value) setParam("q", value); }, 250);

  const query = useInfiniteQuery({
    queryKey: ["parts", params.get("q") ?? "", kind, iface],
    initialPageParam: "",
    queryFn: async ({ pageParam, signal }): Promise<Page> => {
      const sp = new URLSearchParams({ limit: "100" });
      if (params.get("q")) sp.set("q", params.get("q")!);
      if (kind) sp.set("kind", kind);
      if (iface) sp.set("interface", iface);
      if (pageParam) sp.set("cursor", pageParam);
      return fetchJson<Page>(`/api/v1/parts?${sp}`, { signal });
    },
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });
  const rows = useMemo(() => query.data?.pages.flatMap((p) => p.items) ?? [], [query.data]);
  const table = useReactTable({ data: rows, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });

  return (
    <div className="space-y-4">
      <div className="grid gap-3 sm:grid-cols-[2fr_1fr_1fr]" role="search">
        <label className="block"><span className="sr-only">Search</span>
          <input className={inputClass} placeholder="Search maker, model, thread…" value={q} onChange={(e) => { setQ(e.target.value); pushQ(e.target.value); }} />
        </label>
        <label className="block"><span className="sr-only">Kind</span>
          <select className={inputClass} value={kind} onChange={(e) => setParam("kind", e.target.value)}>
            <option value="">Every kind</option>
            {PART_KINDS.map((k) => <option key={k} value={k}>{KIND_LABELS[k]}</option>)}
          </select>
        </label>
        <label className="block"><span className="sr-only">Interface</span>
          <select className={inputClass} value={iface} onChange={(e) => setParam("interface", e.target.value)}>
            <option value="">Any interface</option>
            {INTERFACES.map((i) => <option key={i.code} value={i.code}>{interfaceLabel(i.code)}</option>)}
          </select>
        </label>
      </div>
      {query.isError ? <p role="alert" className="text-bad">{(query.error as Error).message}</p> : null}
      {/* Phones: one card per part, nothing to scroll sideways. */}
      <ul aria-label="Parts" className="divide-y divide-line/70 rounded-lg border border-line bg-surface sm:hidden">
        {rows.map((p) => (
          <li key={p.slug} data-testid="part-card" className="space-y-1.5 px-3 py-3 text-sm">
            <Link href={`/parts/${p.slug}`} className="block font-medium text-ink underline-offset-4 hover:underline">
              <span className="block text-xs font-normal text-muted">{p.maker} · {KIND_LABELS[p.kind] ?? p.kind}</span>{p.model}
            </Link>
            <div className="flex flex-wrap items-center gap-x-2 gap-y-1 text-xs">
              {p.front ? <InterfaceChip code={p.front.interface} gender={p.front.gender} /> : <span className="text-muted">open</span>}
              <span aria-hidden className="text-muted">→</span>
              {p.rear ? <InterfaceChip code={p.rear.interface} gender={p.rear.gender} /> : <span className="text-muted">open</span>}
            </div>
            <p className="num text-xs text-muted">
              {formatMm(p.lengthMm)}{p.adjustMm ? ` +${p.adjustMm}` : ""} long{p.clearApertureMm ? ` · ${formatMm(p.clearApertureMm)} clear` : ""}{p.weightG ? ` · ${formatGrams(p.weightG)}` : ""}
            </p>
          </li>
        ))}
        {!query.isLoading && rows.length === 0 ? <li className="px-3 py-8 text-center text-muted">No part matches. Try fewer words, or <Link className="underline" href="/parts/submit">submit the missing part</Link>.</li> : null}
        {query.isLoading ? <li className="px-3 py-8 text-center text-muted">Loading the catalog…</li> : null}
      </ul>
      <div className="hidden overflow-x-auto rounded-lg border border-line bg-surface sm:block">
        <table className="w-full min-w-[760px] text-left text-sm">
          <thead className="border-b border-line bg-sunken text-xs uppercase tracking-wide text-muted">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>{hg.headers.map((h) => (
                <th key={h.id} scope="col" className="px-3 py-2 font-medium" aria-sort={h.column.getIsSorted() === "asc" ? "ascending" : h.column.getIsSorted() === "desc" ? "descending" : undefined}>
                  <button type="button" onClick={h.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 hover:text-ink">
                    {flexRender(h.column.columnDef.header, h.getContext())}
                    <span aria-hidden>{h.column.getIsSorted() === "asc" ? "▲" : h.column.getIsSorted() === "desc" ? "▼" : ""}</span>
                  </button>
                </th>))}</tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} className="border-b border-line/70 last:border-0 hover:bg-sunken/50">
                {r.getVisibleCells().map((c) => <td key={c.id} className="px-3 py-2 align-top">{flexRender(c.column.columnDef.cell, c.getContext())}</td>)}
              </tr>
            ))}
            {!query.isLoading && rows.length === 0 ? <tr><td colSpan={columns.length} className="px-3 py-8 text-center text-muted">No part matches. Try fewer words, or <Link className="underline" href="/parts/submit">submit the missing part</Link>.</td></tr> : null}
            {query.isLoading ? <tr><td colSpan={columns.length} className="px-3 py-8 text-center text-muted">Loading the catalog…</td></tr> : null}
          </tbody>
        </table>
      </div>
      <div className="flex items-center justify-between text-sm text-muted">
        <span className="num">{rows.length} shown{query.hasNextPage ? ", more available" : ""}</span>
        {query.hasNextPage ? <button type="button" className="rounded-md border border-line bg-surface px-3 py-1.5 text-text hover:border-brass" onClick={() => query.fetchNextPage()} disabled={query.isFetchingNextPage}>{query.isFetchingNextPage ? "Loading…" : "Show more"}</button> : null}
      </div>
    </div>
  );
}
