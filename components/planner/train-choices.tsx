"use client";
// The left column: the train's choices as a vertical rail, sky at the top, sensor at the bottom.
import { useCallback, useState, type ReactNode } from "react";
import type { ApiPart } from "@/lib/catalog/part-json";
import type { PlanState } from "@/lib/planner/url-state";
import { MAX_STATIONS } from "@/lib/planner/url-state";
import { useCorrectorJoins, usePart } from "./api";
import { ChosenPart, SmallButton } from "./chosen-part";
import { LengthUnitProvider } from "./length-unit";
import { PartCombobox } from "./part-combobox";

const STATION_KINDS = ["filter-wheel", "filter-drawer", "oag", "tilt-plate", "other"] as const;
const isCorrector = (p: ApiPart) => (p as { opticsRole?: string }).opticsRole === "corrector";
const opticsRole = (p: ApiPart | undefined) => (p as { opticsRole?: string } | undefined)?.opticsRole;

type Update = (patch: Partial<PlanState>) => void;

function Stop({ title, tone, children, aside }: { title: string; tone: "glass" | "brass" | "station" | "ink"; children: ReactNode; aside?: ReactNode }) {
  const dot = { glass: "bg-glass", brass: "bg-brass", station: "border-2 border-ink bg-station", ink: "bg-ink" }[tone];
  return (
    <li className="relative pb-5 pl-7 last:pb-0">
      <span aria-hidden className="absolute left-[7px] top-5 bottom-0 w-0.5 bg-[repeating-linear-gradient(to_bottom,var(--c-brass)_0_5px,transparent_5px_8px)]" />
      <span aria-hidden className={`absolute left-0 top-1 h-4 w-4 rounded-full ${dot}`} />
      <div className="mb-1.5 flex items-baseline justify-between gap-2">
        <h3 className="text-sm font-semibold text-ink">{title}</h3>
        {aside ? <span className="text-xs text-muted">{aside}</span> : null}
      </div>
      {children}
    </li>
  );
}

function PickOrShow({ slug, label, kinds, accept, mark, onPick, onClear, tone, placeholder, hint, clearLabel }: {
  slug: string | null; label: string; kinds: readonly string[]; accept?: (p: ApiPart) => boolean; onPick: (p: ApiPart) => void;
  mark?: (p: ApiPart) => { text: string; first: boolean } | null;
  onClear: () => void; tone?: "glass" | "plain"; placeholder?: string; hint?: string; clearLabel: string;
}) {
  const [changing, setChanging] = useState(false);
  if (slug && !changing) {
    return <ChosenPart slug={slug} tone={tone} actions={<>
      <SmallButton label={`Change ${label.toLowerCase()}`} onClick={() => setChanging(true)}>Change</SmallButton>
      <SmallButton label={clearLabel} onClick={onClear}>✕</SmallButton>
    </>} />;
  }
  return (
    <div className="space-y-1.5">
      <PartCombobox label={label} kinds={kinds} accept={accept} mark={mark} placeholder={placeholder} hint={hint} autoFocus={changing}
        onPick={(p) => { setChanging(false); onPick(p); }} />
      {changing ? <button type="button" className="text-xs text-muted underline underline-offset-2" onClick={() => setChanging(false)}>Keep the current one</button> : null}
    </div>
  );
}

export function TrainChoices({ state, update }: { state: PlanState; update: Update }) {
  const optics = usePart(state.optics);
  const telescope = opticsRole(optics.data) === "telescope";
  const joins = useCorrectorJoins(telescope ? state.optics : null);
  const markCorrector = useCallback((p: ApiPart) => {
    const j = joins.data?.correctors.find((c) => c.slug === p.slug);
    if (!j) return null;
    if (!j.joins) return { text: "does not join this telescope", first: false };
    return { text: j.adapters === 0 ? "fits this telescope directly" : `fits this telescope with ${j.adapters} adapter${j.adapters === 1 ? "" : "s"}`, first: true };
  }, [joins.data]);
  const move = (i: number, d: -1 | 1) => {
    const s = [...state.stations];
    [s[i], s[i + d]] = [s[i + d], s[i]];
    update({ stations: s });
  };

  return (
    <LengthUnitProvider unit={state.unit}>
    <ol aria-label="The train, from sky to sensor" className="rounded-lg border border-line bg-surface p-4">
      <li aria-hidden className="mb-3 text-[11px] font-medium uppercase tracking-[0.2em] text-muted">☾ Sky side</li>
      <Stop title="Optics" tone="glass" aside="telescope, astrograph or corrector">
        <PickOrShow slug={state.optics} label="Optics" kinds={["optics"]} tone="glass" clearLabel="Remove the optics"
          placeholder="Search telescopes, astrographs, correctors…"
          onPick={(p) => update({ optics: p.slug, corrector: opticsRole(p) === "telescope" ? state.corrector : null })}
          onClear={() => update({ optics: null, corrector: null })} />
      </Stop>
      {telescope ? (
        <Stop title="Corrector" tone="glass" aside="optional">
          <PickOrShow slug={state.corrector} label="Corrector" kinds={["optics"]} accept={isCorrector} mark={markCorrector} tone="glass" clearLabel="Remove the corrector"
            placeholder="Flattener, reducer, coma corrector…"
            hint="Without one, any connection counts: a plain telescope has no back focus to hit."
            onPick={(p) => update({ corrector: p.slug })} onClear={() => update({ corrector: null })} />
        </Stop>
      ) : null}
      <Stop title="Devices in the train" tone="station" aside={state.stations.length ? `${state.stations.length}, in order` : "optional"}>
        {state.stations.length ? (
          <ol aria-label="Devices, sky to sensor" className="mb-2 space-y-1.5">
            {state.stations.map((slug, i) => (
              <li key={`${slug}-${i}`}>
                <ChosenPart slug={slug} tone="station" actions={<>
                  <SmallButton label={`Move device ${i + 1} toward the sky`} disabled={i === 0} onClick={() => move(i, -1)}>↑</SmallButton>
                  <SmallButton label={`Move device ${i + 1} toward the sensor`} disabled={i === state.stations.length - 1} onClick={() => move(i, 1)}>↓</SmallButton>
                  <SmallButton label={`Remove device ${i + 1}`} onClick={() => update({ stations: state.stations.filter((_, j) => j !== i) })}>✕</SmallButton>
                </>} />
              </li>
            ))}
          </ol>
        ) : null}
        {state.stations.length < MAX_STATIONS ? (
          <PartCombobox label="Add a device" kinds={STATION_KINDS} placeholder="Add a wheel, drawer, guider, tilt plate…"
            hint={state.stations.length ? "Added devices go on the sensor side of the list." : "The devices that must be in the train, in order."}
            onPick={(p) => update({ stations: [...state.stations, p.slug] })} />
        ) : <p className="text-xs text-muted">{MAX_STATIONS} devices is the most one train takes here.</p>}
      </Stop>
      <Stop title="Camera" tone="ink">
        <PickOrShow slug={state.camera} label="Camera" kinds={["camera"]} clearLabel="Remove the camera"
          placeholder="Search cameras by maker, model or mount…"
          onPick={(p) => update({ camera: p.slug })} onClear={() => update({ camera: null })} />
      </Stop>
      <li aria-hidden className="mt-3 text-[11px] font-medium uppercase tracking-[0.2em] text-muted">▣ Sensor side</li>
    </ol>
    </LengthUnitProvider>
  );
}
