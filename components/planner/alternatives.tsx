"use client";
// The solutions the solver ranked, one choosable card each (native radios: arrow keys work).
import { useId } from "react";
import type { Chain } from "@/lib/solver";
import { formatPrice } from "@/lib/format";
import { formatMoney } from "@/lib/shops/money";
import { formatLength, type LengthUnit } from "@/lib/units";
import { signed } from "./train-model";
import { MM_PER_INCH } from "@/lib/optics";

function connectors(chain: Chain, names: (id: string) => string): string {
  const counts = new Map<string, number>();
  for (const s of chain.steps) if (s.role === "connector") counts.set(s.partId, (counts.get(s.partId) ?? 0) + 1);
  if (!counts.size) return "Nothing between the parts: they screw together as they are.";
  return [...counts].map(([id, n]) => `${n > 1 ? `${n} × ` : ""}${names(id)}`).join(" + ");
}

/** "Same train, other makers": the variants of one geometry, the ones made of parts you own marked. */
function Variants({ chain, names }: { chain: Chain; names: (id: string) => string }) {
  const variants = chain.variants ?? [];
  if (!variants.length) return null;
  const ownsAll = (c: Chain) => c.steps.some((s) => s.role === "connector") && c.steps.every((s) => s.role !== "connector" || s.partId.endsWith("~owned"));
  return (
    <span className="mt-1.5 block border-t border-line/70 pt-1.5 text-xs text-muted" data-testid="variants">
      <span className="font-medium text-text">Same train, other makers:</span>
      {variants.map((v, i) => (
        <span key={i} className="block">
          {connectors(v, names)}{v.priceCents !== null ? ` · ${v.priceCents === 0 ? "nothing to buy" : formatPrice(v.priceCents)}` : ""}
          {ownsAll(v) ? <span className="ml-1.5 rounded bg-ok/15 px-1 font-medium text-ok">you own these</span> : null}
        </span>
      ))}
    </span>
  );
}

export function Alternatives({ solutions, chosen, onChoose, names, unit, currency }: {
  solutions: Chain[]; chosen: number; onChoose: (i: number) => void; names: (id: string) => string; unit: LengthUnit;
  /** A shop's currency when the answer is priced from its stock. */
  currency?: string;
}) {
  const name = useId();
  if (solutions.length < 2 && !solutions[0]?.variants?.length) return null;
  // The ranking puts fewer parts first; someone completing a train from their own bench
  // often cares more about what is left to buy, so the cheapest answer is marked.
  const known = solutions.map((c) => c.priceCents ?? Infinity);
  const cheapest = Math.min(...known);
  const cheapestIndex = Number.isFinite(cheapest) && cheapest < known[0] ? known.indexOf(cheapest) : -1;
  return (
    <fieldset>
      <legend className="sr-only">Choose an alternative</legend>
      <div className="grid gap-2 md:grid-cols-2">
        {solutions.map((c, i) => (
          <label key={i} className={`relative block cursor-pointer rounded-md border px-3 py-2.5 text-sm transition-colors has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-[var(--c-focus)] ${i === chosen ? "border-brass bg-brass/10" : "border-line bg-surface hover:border-brass/60"}`}>
            <input type="radio" name={name} className="sr-only" checked={i === chosen} onChange={() => onChoose(i)} />
            <span className="flex items-baseline justify-between gap-2">
              <span className="font-semibold text-ink">{i === 0 ? "Best" : `Alternative ${i + 1}`}
                {i === cheapestIndex ? <span className="ml-2 rounded bg-ok/15 px-1.5 py-0.5 text-xs font-medium text-ok">least to buy</span> : null}
              </span>
              <span className="num text-xs text-muted">
                {c.partCount} part{c.partCount === 1 ? "" : "s"} · {c.priceCents === null ? "price unknown" : c.priceCents === 0 ? "nothing to buy" : currency ? formatMoney(c.priceCents, currency) : formatPrice(c.priceCents)}
              </span>
            </span>
            <span className="num mt-0.5 block text-text">
              {formatLength(c.sensorDistanceMm, unit)}
              {c.errorMm !== null ? <span className="text-muted"> ({signed(unit === "in" ? c.errorMm / MM_PER_INCH : c.errorMm, unit === "in" ? 3 : 2)} {unit})</span> : null}
              {c.warnings.length ? <span className="ml-2 text-warn">▲ {c.warnings.length} warning{c.warnings.length === 1 ? "" : "s"}</span> : null}
            </span>
            <span className="mt-1 block text-xs text-muted">{connectors(c, names)}</span>
            <Variants chain={c} names={names} />
          </label>
        ))}
      </div>
    </fieldset>
  );
}
