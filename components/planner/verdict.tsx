"use client";
// The answer in one line, in big numbers: where the sensor lands against the window.
import type { Chain } from "@/lib/solver";
import type { PlanResponse } from "@/lib/planner/api-types";
import { formatPrice } from "@/lib/format";
import { formatMoney } from "@/lib/shops/money";
import type { LengthUnit } from "@/lib/units";
import { isInside, signed } from "./train-model";
import { MM_PER_INCH } from "@/lib/optics";

const STATUS = {
  "ok": { label: "Reaches focus", tone: "text-ok border-ok/50 bg-ok/10" },
  "out-of-reach": { label: "Misses the window", tone: "text-warn border-warn/50 bg-warn/10" },
  "too-long": { label: "Too long", tone: "text-bad border-bad/50 bg-bad/10" },
  "no-connection": { label: "Does not connect", tone: "text-bad border-bad/50 bg-bad/10" },
} as const;

function Big({ mm, unit, digits = 2 }: { mm: number; unit: LengthUnit; digits?: number }) {
  const v = unit === "in" ? (mm / MM_PER_INCH).toFixed(digits + 1) : mm.toFixed(digits);
  return <><strong className="num text-[1.35em] font-semibold tracking-tight text-ink">{v}</strong><span className="text-muted"> {unit}</span></>;
}

export function Verdict({ result, chain, index, unit, onUnit }: {
  result: PlanResponse; chain: Chain | null; index: number; unit: LengthUnit; onUnit: (u: LengthUnit) => void;
}) {
  const s = STATUS[result.status];
  const T = result.targetMm, tol = result.toleranceMm;
  const inside = result.status === "ok" && isInside(chain, tol);
  const tolText = tol === null ? "" : unit === "in" ? (tol / MM_PER_INCH).toFixed(3) : tol.toFixed(2);
  const err = chain?.errorMm;
  const toBuy = chain?.priceCents;
  return (
    <div data-testid="plan-verdict" data-status={result.status} className="rounded-lg border border-line bg-surface px-4 py-3 sm:px-5">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <span className={`inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-xs font-semibold uppercase tracking-wider ${s.tone}`}>
          <span aria-hidden>{result.status === "ok" ? "●" : "▲"}</span>{s.label}
        </span>
        <div role="radiogroup" aria-label="Units" className="inline-flex rounded-md border border-line p-0.5 text-xs">
          {(["mm", "in"] as const).map((u) => (
            <button key={u} type="button" role="radio" aria-checked={unit === u} onClick={() => onUnit(u)}
              className={`rounded px-2.5 py-1 ${unit === u ? "bg-ink text-bg" : "text-muted hover:text-text"}`}>
              {u === "mm" ? "Millimetres" : "Inches"}
            </button>
          ))}
        </div>
      </div>
      <p className="mt-2 text-lg leading-snug text-text sm:text-xl" aria-live="polite">
        {result.missingJoint ? (
          <>
            <span className="font-semibold text-bad">The telescope does not join the corrector.</span>{" "}
            <span className="text-base text-text">{result.missingJoint.detail}</span>
          </>
        ) : result.status === "out-of-reach" && T !== null && result.nearest ? (
          <>
            Closest reachable{" "}
            {result.nearest.belowMm !== null ? <><Big mm={result.nearest.belowMm} unit={unit} /> <span className="num text-base text-muted">({signed(unit === "in" ? (result.nearest.belowMm - T) / MM_PER_INCH : result.nearest.belowMm - T, unit === "in" ? 3 : 2)})</span></> : null}
            {result.nearest.belowMm !== null && result.nearest.aboveMm !== null ? " and " : null}
            {result.nearest.aboveMm !== null ? <><Big mm={result.nearest.aboveMm} unit={unit} /> <span className="num text-base text-muted">({signed(unit === "in" ? (result.nearest.aboveMm - T) / MM_PER_INCH : result.nearest.aboveMm - T, unit === "in" ? 3 : 2)})</span></> : null}
            {" "}<span className="text-muted">—</span> target <Big mm={T} unit={unit} /><span className="num text-muted"> ± {tolText}</span>{" "}
            <span className="text-muted">—</span> <span className="font-semibold text-bad">nothing lands in the window</span>
          </>
        ) : chain && T !== null ? (
          <>
            Sensor at <Big mm={chain.sensorDistanceMm} unit={unit} /> <span className="text-muted">—</span> target <Big mm={T} unit={unit} />
            <span className="num text-muted"> ± {tolText}</span> <span className="text-muted">—</span>{" "}
            <span className={inside ? "font-semibold text-ok" : "font-semibold text-bad"}>
              {inside ? "inside the window" : result.status === "too-long" ? "too long even at its shortest" : "outside the window"}
            </span>
            {err !== null && err !== undefined ? <span className="num text-base text-muted"> ({signed(unit === "in" ? err / MM_PER_INCH : err, unit === "in" ? 3 : 2)} {unit})</span> : null}
          </>
        ) : chain ? (
          <>Connected: sensor <Big mm={chain.sensorDistanceMm} unit={unit} digits={1} /> behind the focuser&apos;s joint <span className="text-base text-muted">— this optic sets no back focus, so the focuser takes up the rest.</span></>
        ) : (
          <span className="text-ink">{result.reason ?? "No chain joins these parts."}</span>
        )}
      </p>
      {chain && result.status === "ok" ? (
        <p className="num mt-1 text-sm text-muted">
          {chain.partCount === 0 ? "No connecting parts needed" : `${chain.partCount} connecting part${chain.partCount === 1 ? "" : "s"}`}
          {toBuy !== null && toBuy !== undefined ? ` · ${toBuy === 0 ? "nothing to buy" : result.context.shop ? `${formatMoney(toBuy, result.context.shop.currency)} at ${result.context.shop.name}` : `${formatPrice(toBuy)} at list prices`}` : " · some prices unknown"}
          {result.solutions.length > 1 ? ` · alternative ${index + 1} of ${result.solutions.length}` : ""}
          {chain.warnings.length ? <> · <a href="#plan-checks" className="text-warn underline underline-offset-2">▲ {chain.warnings.length} warning{chain.warnings.length === 1 ? "" : "s"}</a></> : null}
        </p>
      ) : result.missingJoint && chain ? (
        <p className="num mt-1 text-sm text-muted">
          Behind the corrector the train would {result.rearStatus === "ok" ? "reach" : "still miss"} focus
          {T !== null ? <> (sensor at {chain.sensorDistanceMm.toFixed(2)} mm for {T.toFixed(2)} mm)</> : null}, once the joint in front is closed.
        </p>
      ) : result.reason && chain ? <p className="mt-1 text-sm text-text">{result.reason}</p> : null}
    </div>
  );
}
