"use client";
// The glass in the beam, the tolerance override and where the parts come from.
import Link from "next/link";
import { ShopSourceChoice } from "@/components/shops/shop-source-choice";
import { useId } from "react";
import { filterShiftMm } from "@/lib/optics";
import type { Glass, PlanState } from "@/lib/planner/url-state";
import { formatLength } from "@/lib/units";
import { LengthUnitProvider, useLengthUnit } from "./length-unit";
import { NumberField } from "./number-field";

type Update = (patch: Partial<PlanState>) => void;

const RADIO = "mt-1 h-3.5 w-3.5 shrink-0 appearance-none rounded-full border border-muted bg-surface checked:border-4 checked:border-brass disabled:border-line disabled:bg-sunken";

export const MATERIALS = [
  { label: "N-BK7", n: 1.5168 },
  { label: "Fused silica", n: 1.458 },
] as const;
const THICKNESSES = [1, 2, 3] as const;

function materialName(n: number): string {
  return MATERIALS.find((m) => m.n === n)?.label ?? `n ${n}`;
}

function Chip({ pressed, onClick, children, label }: { pressed: boolean; onClick: () => void; children: React.ReactNode; label?: string }) {
  return (
    <button type="button" aria-pressed={pressed} aria-label={label} onClick={onClick}
      className={`num rounded-md border px-2.5 py-1.5 text-sm transition-colors ${pressed ? "border-brass bg-brass/15 font-medium text-ink" : "border-line bg-surface text-text hover:border-brass"}`}>
      {children}
    </button>
  );
}

function GlassEditor({ title, glass, onChange, allowNone }: { title: string; glass: Glass | null; onChange: (g: Glass | null) => void; allowNone: string }) {
  const unit = useLengthUnit();
  const n = glass?.refractiveIndex ?? MATERIALS[0].n;
  const custom = glass !== null && !THICKNESSES.includes(glass.thicknessMm as 1 | 2 | 3);
  const otherN = glass !== null && !MATERIALS.some((m) => m.n === glass.refractiveIndex);
  return (
    <fieldset className="space-y-2">
      <legend className="mb-1.5 text-sm font-semibold text-ink">{title}</legend>
      <div role="group" aria-label={`${title}: thickness`} className="flex flex-wrap gap-1.5">
        <Chip pressed={glass === null} onClick={() => onChange(null)}>{allowNone}</Chip>
        {THICKNESSES.map((t) => (
          <Chip key={t} pressed={glass?.thicknessMm === t} label={`${t} mm glass`} onClick={() => onChange({ thicknessMm: t, refractiveIndex: n })}>{t} mm</Chip>
        ))}
        <Chip pressed={custom} onClick={() => onChange({ thicknessMm: glass?.thicknessMm && custom ? glass.thicknessMm : 2.5, refractiveIndex: n })}>Other</Chip>
      </div>
      {glass ? (
        <div className="grid grid-cols-2 gap-2">
          {custom ? (
            <NumberField label="Thickness" unit="mm" min={0.1} max={10} value={glass.thicknessMm}
              onChange={(v) => v !== null && onChange({ ...glass, thicknessMm: v })} />
          ) : null}
          <div className={custom ? "" : "col-span-2"}>
            <div role="group" aria-label={`${title}: material`} className="flex flex-wrap gap-1.5">
              {MATERIALS.map((m) => (
                <Chip key={m.n} pressed={glass.refractiveIndex === m.n} onClick={() => onChange({ ...glass, refractiveIndex: m.n })}>
                  {m.label} <span className="text-xs text-muted">n {m.n}</span>
                </Chip>
              ))}
              <Chip pressed={otherN} onClick={() => onChange({ ...glass, refractiveIndex: otherN ? glass.refractiveIndex : 1.5 })}>Other index</Chip>
            </div>
          </div>
          {otherN ? (
            <NumberField className="col-span-2 sm:col-span-1" label="Refractive index n" min={1} max={2.5} value={glass.refractiveIndex}
              onChange={(v) => v !== null && onChange({ ...glass, refractiveIndex: v })} />
          ) : null}
          <p className={`num col-span-2 self-end text-xs text-muted ${otherN ? "sm:col-span-1" : ""}`}>
            {glass.thicknessMm} mm of {materialName(glass.refractiveIndex)} pushes focus back <strong className="text-text">{unit === "mm" ? `${filterShiftMm(glass.thicknessMm, glass.refractiveIndex).toFixed(2)} mm` : formatLength(filterShiftMm(glass.thicknessMm, glass.refractiveIndex), unit)}</strong>.
          </p>
        </div>
      ) : null}
    </fieldset>
  );
}

export function BeamOptions({ state, update, signedIn, signInHref, opticsTolerance }: {
  state: PlanState; update: Update; signedIn: boolean; signInHref: string; opticsTolerance: number | null;
}) {
  const id = useId();
  return (
    <LengthUnitProvider unit={state.unit}>
    <div className="space-y-5 rounded-lg border border-line bg-surface p-4">
      <GlassEditor title="Filter in the beam" allowNone="None" glass={state.filter} onChange={(filter) => update({ filter })} />
      {state.extraGlass ? (
        <GlassEditor title="Other glass in the beam" allowNone="None" glass={state.extraGlass} onChange={(extraGlass) => update({ extraGlass })} />
      ) : (
        <button type="button" className="text-sm text-text underline decoration-brass underline-offset-4 hover:text-ink"
          onClick={() => update({ extraGlass: { thicknessMm: 1, refractiveIndex: MATERIALS[0].n } })}>
          + Other glass in the beam (a second filter, a window)
        </button>
      )}
      <div>
        <NumberField label="Tolerance override (±)" unit="mm" min={0.01} max={10} value={state.toleranceMm}
          placeholder={opticsTolerance !== null ? `${opticsTolerance} — the maker's` : "the maker's figure"}
          onChange={(toleranceMm) => update({ toleranceMm })} />
        <p className="mt-1 text-xs text-muted">
          {state.unit === "in" && state.toleranceMm !== null ? <span className="num">± {formatLength(state.toleranceMm, "in")}. </span> : null}
          Leave empty to use the corrector maker&apos;s tolerance. Fast optics want less.
        </p>
      </div>
      <fieldset>
        <legend className="mb-1.5 text-sm font-semibold text-ink">Draw the parts from</legend>
        <div className="space-y-1.5 text-sm">
          <label className="flex cursor-pointer items-start gap-2">
            <input type="radio" name={`${id}-source`} className={RADIO} checked={state.source === "catalog"} onChange={() => update({ source: "catalog" })} />
            <span>The whole catalog<span className="block text-xs text-muted">Every adapter, spacer and extension, at list prices.</span></span>
          </label>
          <label className={`flex items-start gap-2 ${signedIn ? "cursor-pointer" : "cursor-not-allowed"}`}>
            <input type="radio" name={`${id}-source`} className={RADIO} disabled={!signedIn}
              checked={state.source === "owned"} onChange={() => update({ source: "owned" })} aria-describedby={`${id}-owned`} />
            <span className={signedIn ? "" : "text-muted"}>What I own, then the catalog
              <span id={`${id}-owned`} className="block text-xs text-muted">
                {signedIn ? "Your own parts count as free; the catalog fills the rest."
                  : <>Needs your parts list: <Link href={signInHref} className="text-text underline decoration-brass underline-offset-2">sign in</Link> first.</>}
              </span>
            </span>
          </label>
          <ShopSourceChoice name={`${id}-source`} radioClass={RADIO} active={state.source === "shop"} shop={state.shop} shopOwned={state.shopOwned}
            signedIn={signedIn} onChange={(p) => update(p)} />
        </div>
      </fieldset>
    </div>
    </LengthUnitProvider>
  );
}
