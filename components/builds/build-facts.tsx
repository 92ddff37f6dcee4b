import { landsInside, signedMm } from "@/lib/builds/train";
import { formatGrams } from "@/lib/format";
import { formatMm } from "@/lib/units";
import type { PlanResponse } from "@/lib/planner/api-types";
import { focuserLoad } from "@/lib/planner/load";
import type { Chain } from "@/lib/solver/types";

/** The numbers an expert checks first: where the sensor lands against the window, and the optics. */
export function BuildFacts({ result, chain, stale = false }: { result: PlanResponse; chain: Chain; stale?: boolean }) {
  const ctx = result.context;
  const inside = landsInside(chain, result.toleranceMm);
  const load = focuserLoad(result, chain);
  const weight = load.grams;
  const facts: { label: string; value: string; note?: string; tone?: "ok" | "bad" }[] = [
    {
      label: "Sensor lands at", value: formatMm(chain.sensorDistanceMm, 2),
      note: stale ? "as saved: see the re-check above" : chain.errorMm === null ? "no back focus to meet" : `${signedMm(chain.errorMm)} mm from target`,
      tone: stale ? undefined : inside ? "ok" : "bad",
    },
    ...(result.targetMm !== null ? [{
      label: "Target", value: `${result.targetMm.toFixed(2)} ± ${(result.toleranceMm ?? 0).toFixed(2)} mm`,
      note: result.filterShiftMm > 0 ? `back focus ${(result.targetMm - result.filterShiftMm).toFixed(2)} + ${result.filterShiftMm.toFixed(2)} for filter glass` : "back focus, no filter glass",
    }] : []),
    { label: "Connecting parts", value: String(chain.partCount), note: chain.partCount === 0 ? "the items mate directly" : undefined },
    ...(ctx.focalLengthMm ? [{ label: "Focal length", value: formatMm(ctx.focalLengthMm, 0), note: ctx.focalRatio ? `f/${ctx.focalRatio.toFixed(1)}` : undefined }] : []),
    ...(ctx.plateScaleArcsecPerPx ? [{ label: "Image scale", value: `${ctx.plateScaleArcsecPerPx.toFixed(2)}″/px`, note: ctx.fieldOfViewDeg ? `field ${ctx.fieldOfViewDeg.width.toFixed(2)}° × ${ctx.fieldOfViewDeg.height.toFixed(2)}°` : undefined }] : []),
    ...(weight > 0 ? [{
      label: "Load on the focuser", value: `${load.unknown ? "≥ " : ""}${formatGrams(weight)}`,
      note: ctx.maxLoadG ? `of ${formatGrams(ctx.maxLoadG)} rated${ctx.telescopeId ? ", corrector included" : ""}` : undefined,
      tone: load.over ? "bad" as const : undefined,
    }] : []),
  ];
  return (
    <dl className="grid grid-cols-2 gap-px overflow-hidden rounded-lg border border-line bg-line sm:grid-cols-3 lg:grid-cols-6">
      {facts.map((f) => (
        <div key={f.label} className="bg-surface px-4 py-3">
          <dt className="text-xs text-muted">{f.label}</dt>
          <dd className={`num mt-0.5 text-lg font-semibold ${f.tone === "ok" ? "text-ok" : f.tone === "bad" ? "text-bad" : "text-ink"}`}>{f.value}</dd>
          {f.note ? <dd className="num text-xs text-muted">{f.note}</dd> : null}
        </div>
      ))}
    </dl>
  );
}
