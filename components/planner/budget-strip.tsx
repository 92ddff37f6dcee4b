"use client";
// The back focus budget to scale: each item's share from the optics' rear joint plane (0),
// the target, the tolerance band, the filter's added path, and where the sensor lands.
import { useId } from "react";
import type { Chain } from "@/lib/solver";
import type { Nearest } from "@/lib/solver";
import { formatLength, type LengthUnit } from "@/lib/units";
import { BudgetLoupe, loupeRange } from "./budget-loupe";
import { SEGMENT_FILL } from "./segment-fill";
import { ticks } from "./ruler";
import { RulerAxis } from "./ruler-axis";
import { signed } from "./train-model";
import { useWidth } from "./use-width";
import { MM_PER_INCH } from "@/lib/optics";

type Props = {
  chain: Chain;
  names: (partId: string) => string;
  targetMm: number | null;
  toleranceMm: number | null;
  filterShiftMm: number;
  nearest?: Nearest | null;
  unit: LengthUnit;
};


export function BudgetStrip({ chain, names, targetMm, toleranceMm, filterShiftMm, nearest, unit }: Props) {
  const [ref, W] = useWidth<HTMLDivElement>();
  const hatch = `hatch-${useId().replace(/[^a-zA-Z0-9]/g, "")}`;
  const D = chain.sensorDistanceMm;
  const tol = toleranceMm ?? 0;
  const far = Math.max(D, targetMm !== null ? targetMm + tol : 0, nearest?.aboveMm ?? 0);
  const maxMm = far * 1.07 + 1;
  const left = 14, right = 14;
  const px = (W - left - right) / maxMm;
  const x = (mm: number) => left + mm * px;
  const inside = chain.errorMm === null || toleranceMm === null ? true : Math.abs(chain.errorMm) <= tol + 1e-6;
  const mark = inside ? "var(--c-ok)" : "var(--c-bad)";
  const t = ticks(0, maxMm, px, unit);
  const clampX = (v: number, half: number) => Math.min(W - half - 2, Math.max(half + 2, v));
  const short = (mm: number) => unit === "in" ? (mm / MM_PER_INCH).toFixed(2) : mm.toFixed(1);
  const errText = chain.errorMm === null ? "" : ` · ${signed(unit === "in" ? chain.errorMm / MM_PER_INCH : chain.errorMm, unit === "in" ? 3 : 2)} ${unit}`;
  const sensorText = `sensor ${unit === "in" ? formatLength(D, "in") : `${D.toFixed(2)} mm`}${errText}`;
  const B = targetMm !== null ? targetMm - filterShiftMm : null;
  const targetText = targetMm !== null
    ? `target ${unit === "in" ? (targetMm / MM_PER_INCH).toFixed(3) : targetMm.toFixed(2)} ± ${unit === "in" ? (tol / MM_PER_INCH).toFixed(3) : tol.toFixed(2)}`
    : "";
  const H = 150;
  const loupe = targetMm !== null && toleranceMm !== null ? loupeRange({ sensorMm: D, targetMm, toleranceMm, filterShiftMm, nearest }) : null;

  return (
    <div ref={ref} className="w-full">
      <svg data-testid="budget-strip" data-inside={String(inside)} width={W} height={H} viewBox={`0 0 ${W} ${H}`} className="block"
        role="img" aria-label={`Back focus budget: ${sensorText}${targetMm !== null ? `, ${targetText} ${unit}, ${inside ? "inside" : "outside"} the window` : ""}`}>
        <defs>
          <pattern id={hatch} width="5" height="5" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <rect width="5" height="5" fill="color-mix(in srgb, var(--c-glass) 22%, var(--c-surface))" />
            <line x1="0" y1="0" x2="0" y2="5" stroke="var(--c-glass-ink)" strokeWidth="2" />
          </pattern>
        </defs>
        {chain.steps.map((s, i) => {
          const x0 = x(s.startMm), w = s.lengthMm * px;
          const name = names(s.partId);
          return (
            <g key={i}>
              <title>{`${name}: ${formatLength(s.lengthMm, unit)} from ${formatLength(s.startMm, unit)}`}</title>
              <rect x={x0} y={34} width={Math.max(0.5, w)} height={42} fill={SEGMENT_FILL[s.role]} stroke="var(--c-ink)" strokeOpacity={0.55} strokeWidth={1} />
              {w >= 34 ? <text x={x0 + w / 2} y={w >= 120 ? 52 : 59} textAnchor="middle" fontSize="11" fill="var(--c-text)" className="num">{short(s.lengthMm)}</text> : null}
              {w >= 120 ? <text x={x0 + w / 2} y={67} textAnchor="middle" fontSize="10" fill="var(--c-muted)">{name.length > w / 6 ? `${name.slice(0, Math.floor(w / 6) - 1)}…` : name}</text> : null}
            </g>
          );
        })}
        {targetMm !== null ? (
          <g>
            <rect x={x(targetMm - tol)} y={28} width={Math.max(2, 2 * tol * px)} height={52} fill="var(--c-ok)" fillOpacity={0.16} stroke="var(--c-ok)" strokeOpacity={0.7} strokeDasharray="3 2" />
            {filterShiftMm > 0 && B !== null ? <rect x={x(B)} y={20} width={Math.max(2, filterShiftMm * px)} height={8} fill={`url(#${hatch})`} stroke="var(--c-glass-ink)" strokeWidth={0.8} /> : null}
            {filterShiftMm > 0 && B !== null ? <text x={x(B) - 4} y={27} textAnchor="end" fontSize="10" fill="var(--c-glass-ink)" className="num">filter +{short(filterShiftMm)}</text> : null}
            <line x1={x(targetMm)} x2={x(targetMm)} y1={14} y2={84} stroke="var(--c-ink)" strokeWidth={1.5} />
            <text x={clampX(x(targetMm), targetText.length * 3.3 + 4)} y={11} textAnchor="middle" fontSize="11" fontWeight={600} fill="var(--c-ink)" className="num">{targetText}</text>
          </g>
        ) : null}
        {[nearest?.belowMm, nearest?.aboveMm].map((n, i) => n === null || n === undefined || Math.abs(n - D) < 1e-6 ? null : (
          <g key={i}>
            <line x1={x(n)} x2={x(n)} y1={30} y2={112} stroke="var(--c-muted)" strokeDasharray="2 2" />
            <path d={`M${x(n)},112 l-5,8 h10 z`} fill="none" stroke="var(--c-muted)" />
            <text x={x(n) + (i ? 7 : -7)} y={120} textAnchor={i ? "start" : "end"} fontSize="10" fill="var(--c-muted)" className="num">{short(n)}</text>
          </g>
        ))}
        <RulerAxis x={x} from={left} to={W - right} y={86} ticks={t} unit={unit} />
        {loupe ? <path d={`M${x(loupe[0])},108 v4 H${x(loupe[1])} v-4`} fill="none" stroke="var(--c-muted)" strokeWidth={1} /> : null}
        <g data-testid="sensor-marker">
          <line x1={x(D)} x2={x(D)} y1={28} y2={122} stroke={mark} strokeWidth={2.5} />
          <path d={`M${x(D)},120 l-7,11 h14 z`} fill={mark} />
          <text x={clampX(x(D), (sensorText.length + (inside ? 0 : 10)) * 3.4 + 4)} y={145} textAnchor="middle" fontSize="12" fontWeight={600} fill={mark} className="num">{sensorText}{inside ? "" : " — outside"}</text>
        </g>
      </svg>
      {targetMm !== null && toleranceMm !== null ? (
        <BudgetLoupe steps={chain.steps} sensorMm={D} targetMm={targetMm} toleranceMm={toleranceMm} filterShiftMm={filterShiftMm}
          nearest={nearest} unit={unit} hatch={hatch} inside={inside} />
      ) : null}
      <p className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-xs text-muted">
        <span>{unit === "in" ? "Inches" : "Millimetres"} from the {targetMm !== null ? "corrector’s" : "optics’"} rear joint plane (0).</span>
        <Key swatch={<span className="inline-block h-2.5 w-3 border border-ok/70 bg-ok/20" />}>the window</Key>
        {filterShiftMm > 0 ? <Key swatch={<svg width="12" height="10" aria-hidden><rect width="12" height="10" fill={`url(#${hatch})`} /></svg>}>path the filter adds</Key> : null}
        <Key swatch={<span className="inline-block h-2.5 w-3 border border-ink/50" style={{ background: SEGMENT_FILL.connector }} />}>connector</Key>
        <Key swatch={<span className="inline-block h-2.5 w-3 border border-ink/50 bg-station" />}>device</Key>
        <Key swatch={<span className="inline-block h-2.5 w-3 border border-ink/50 bg-sunken" />}>camera</Key>
      </p>
    </div>
  );
}

function Key({ swatch, children }: { swatch: React.ReactNode; children: React.ReactNode }) {
  return <span className="inline-flex items-center gap-1.5">{swatch}{children}</span>;
}
