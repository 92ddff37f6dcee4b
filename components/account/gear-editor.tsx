"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { useDebounce } from "use-debounce";
import type { ApiPart } from "@/lib/catalog/part-json";
import { KIND_LABELS } from "@/lib/format";
import { formatMm } from "@/lib/units";
import { fetchJson } from "@/components/api-client";
import { inputClass } from "@/components/ui/field";
import { InterfaceChip } from "@/components/parts/interface-chip";

type Owned = { part: ApiPart; quantity: number };

export function GearEditor() {
  const qc = useQueryClient();
  const gear = useQuery({ queryKey: ["gear"], queryFn: ({ signal }) => fetchJson<{ items: Owned[] }>("/api/v1/gear", { signal }) });
  const setQty = useMutation({
    mutationFn: (v: { partId: string; quantity: number }) => fetchJson("/api/v1/gear", { method: "PUT", headers: { "content-type": "application/json" }, body: JSON.stringify(v) }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ["gear"] }),
  });
  const [q, setQ] = useState("");
  const [debounced] = useDebounce(q.trim(), 250);
  const search = useQuery({
    queryKey: ["gear-search", debounced], enabled: debounced.length >= 2,
    queryFn: ({ signal }) => fetchJson<{ items: ApiPart[] }>(`/api/v1/parts?limit=12&q=${encodeURIComponent(debounced)}`, { signal }),
  });
  const owned = new Map((gear.data?.items ?? []).map((o) => [o.part.id, o.quantity]));

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_380px]">
      <section aria-label="What you own" className="rounded-lg border border-line bg-surface">
        {gear.isLoading ? <p className="p-5 text-muted">Loading your gear…</p> : null}
        {gear.isError ? <p role="alert" className="p-5 text-bad">{(gear.error as Error).message}</p> : null}
        {gear.data && gear.data.items.length === 0 ? <p className="p-5 text-muted">Nothing yet. Search on the right and add what is on your bench.</p> : null}
        <ul>
          {gear.data?.items.map(({ part, quantity }) => (
            <li key={part.id} className="flex flex-wrap items-center gap-3 border-b border-line/70 px-5 py-3 text-sm last:border-0">
              <div className="min-w-0 flex-1">
                <Link href={`/parts/${part.slug}`} className="font-medium text-ink hover:underline">{part.name}</Link>
                <div className="flex flex-wrap gap-3 text-muted">
                  <span>{KIND_LABELS[part.kind]}</span>
                  {part.front ? <InterfaceChip code={part.front.interface} gender={part.front.gender} /> : null}
                  {part.rear ? <InterfaceChip code={part.rear.interface} gender={part.rear.gender} /> : null}
                  <span className="num">{formatMm(part.lengthMm)}</span>
                </div>
              </div>
              <div className="flex items-center gap-1" role="group" aria-label={`How many ${part.name}`}>
                <button type="button" className="h-8 w-8 rounded border border-line hover:border-brass" aria-label="One fewer" onClick={() => setQty.mutate({ partId: part.id, quantity: quantity - 1 })}>−</button>
                <span className="num w-8 text-center">{quantity}</span>
                <button type="button" className="h-8 w-8 rounded border border-line hover:border-brass" aria-label="One more" onClick={() => setQty.mutate({ partId: part.id, quantity: quantity + 1 })}>+</button>
              </div>
            </li>
          ))}
        </ul>
      </section>
      <section aria-label="Add parts" className="space-y-3">
        <label className="block text-sm font-medium">Add a part you own
          <input className={`${inputClass} mt-1.5`} placeholder="Search: spacer 10, M48, wheel…" value={q} onChange={(e) => setQ(e.target.value)} />
        </label>
        {setQty.isError ? <p role="alert" className="text-sm text-bad">{(setQty.error as Error).message}</p> : null}
        <ul className="space-y-1">
          {search.data?.items.map((p) => (
            <li key={p.id} className="flex items-center justify-between gap-2 rounded-md border border-line bg-surface px-3 py-2 text-sm">
              <span className="min-w-0"><span className="block truncate">{p.name}</span><span className="text-xs text-muted">{KIND_LABELS[p.kind]} · <span className="num">{formatMm(p.lengthMm)}</span></span></span>
              <button type="button" className="shrink-0 rounded border border-line px-2 py-1 hover:border-brass" onClick={() => setQty.mutate({ partId: p.id, quantity: (owned.get(p.id) ?? 0) + 1 })}>
                {owned.has(p.id) ? `Own ${owned.get(p.id)} · add one` : "I own this"}
              </button>
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
