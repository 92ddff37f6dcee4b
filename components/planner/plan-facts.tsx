"use client";
// What the optics and camera make of the sky, and the warnings on the chosen chain, in words with numbers.
import type { Chain } from "@/lib/solver";
import type { PlanResponse } from "@/lib/planner/api-types";
import { focuserLoad } from "@/lib/planner/load";
import { formatGrams } from "@/lib/format";

function angle(deg: number): string {
  return deg >= 1 ? `${deg.toFixed(2)}°` : `${(deg * 60).toFixed(1)}′`;
}

export function OpticsFacts({ result, chain }: { result: PlanResponse; chain: Chain | null }) {
  const ctx = result.context;
  const rows: [string, React.ReactNode, string?][] = [];
  if (ctx.focalLengthMm) rows.push(["Focal length", `${Math.round(ctx.focalLengthMm)} mm${ctx.focalRatio ? ` · f/${ctx.focalRatio.toFixed(1)}` : ""}`, ctx.telescopeId ? "with the corrector's factor" : undefined]);
  if (ctx.plateScaleArcsecPerPx) rows.push(["Plate scale", `${ctx.plateScaleArcsecPerPx.toFixed(2)}″ per pixel`, ctx.pixelSizeUm ? `${ctx.pixelSizeUm} µm pixels` : undefined]);
  if (ctx.fieldOfViewDeg) rows.push(["Field of view", `${angle(ctx.fieldOfViewDeg.width)} × ${angle(ctx.fieldOfViewDeg.height)}`, `${angle(ctx.fieldOfViewDeg.diagonal)} corner to corner`]);
  if (ctx.criticalFocusZoneUm) rows.push(["Critical focus zone", `${Math.round(ctx.criticalFocusZoneUm)} µm`, "total depth at 550 nm: how finely to focus"]);
  if (ctx.sensorDiagonalMm) {
    const over = ctx.imageCircleMm !== null && ctx.sensorDiagonalMm > ctx.imageCircleMm;
    rows.push(["Sensor / image circle", <span key="c" className={over ? "text-warn" : ""}>{ctx.sensorDiagonalMm.toFixed(1)} mm{ctx.imageCircleMm ? ` in ${ctx.imageCircleMm} mm` : ""}</span>,
      ctx.imageCircleMm ? over ? "corners fall outside the corrected field" : "the corrected field covers the sensor" : "corrected field not published"]);
  }
  const w = focuserLoad(result, chain);
  if (ctx.maxLoadG) {
    const over = w.over;
    rows.push(["Load on the focuser", <span key="l" className={over ? "font-semibold text-bad" : ""}>{w.unknown ? "≥ " : ""}{formatGrams(w.grams)} of {formatGrams(ctx.maxLoadG)}</span>,
      w.unknown ? `${w.unknown} part${w.unknown === 1 ? "" : "s"} without a published weight` : undefined]);
  }
  if (!rows.length) return null;
  return (
    <dl className="grid grid-cols-2 gap-px overflow-hidden rounded-md border border-line bg-line xl:grid-cols-3">
      {rows.map(([k, v, note]) => (
        <div key={k} className="bg-surface px-3 py-2.5">
          <dt className="text-xs uppercase tracking-wide text-muted">{k}</dt>
          <dd className="num mt-0.5 text-base font-medium text-ink">{v}</dd>
          {note ? <dd className="text-xs text-muted">{note}</dd> : null}
        </div>
      ))}
    </dl>
  );
}

const WARN_TITLE: Record<string, string> = { vignetting: "Vignetting", "image-circle": "Sensor larger than the image circle", load: "Over the focuser's load" };

export function ChainWarnings({ chain, names }: { chain: Chain | null; names: (id: string) => string }) {
  const warnings = chain?.warnings ?? [];
  if (!warnings.length) {
    return chain ? <p className="flex items-center gap-2 text-sm text-ok"><span aria-hidden>✓</span> No vignetting, image-circle or load problems found on this chain.</p> : null;
  }
  return (
    <ul className="space-y-2" aria-label="Warnings">
      {warnings.map((w, i) => (
        <li key={i} className={`rounded-md border px-3 py-2 text-sm ${w.code === "load" ? "border-bad/50 bg-bad/5" : "border-warn/50 bg-warn/5"}`}>
          <p className={`font-semibold ${w.code === "load" ? "text-bad" : "text-warn"}`}>
            <span aria-hidden>▲ </span>{WARN_TITLE[w.code] ?? w.code}{w.partId ? <span className="font-normal text-muted"> · {names(w.partId)}</span> : null}
          </p>
          <p className="mt-0.5 text-text">{w.message}</p>
        </li>
      ))}
    </ul>
  );
}
