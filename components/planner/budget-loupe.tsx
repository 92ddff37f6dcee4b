"use client";
// A close-up of the few millimetres around the target, where the window and the error are
// too fine to read on the full-length strip.
import type { Nearest, Step } from "@/lib/solver";
import { SEGMENT_FILL } from "./segment-fill";
import type { LengthUnit } from "@/lib/units";
import { tickLabel, ticks } from "./ruler";
import { RulerAxis } from "./ruler-axis";
import { signed } from "./train-model";
import { useWidth } from "./use-width";
import { MM_PER_INCH } from "@/lib/optics";

type Range = { sensorMm: number; targetMm: number; toleranceMm: number; filterShiftMm: number; nearest?: Nearest | null };
type Props = Range & { steps: Step[]; unit: LengthUnit; hatch: string; inside: boolean };

function nearOnes(nearest: Nearest | null | undefined, sensorMm: number): number[] {
  return [nearest?.belowMm, nearest?.aboveMm].filter((n): n is number => typeof n === "number" && Math.abs(n - sensorMm) > 1e-6);
}

/** The stretch the close-up shows: the window, the filter's path, and the sensor or nearest chains when close. */
export function loupeRange({ sensorMm, targetMm: T, toleranceMm: tol, filterShiftMm, nearest }: Range): [number, number] {
  const reach = [sensorMm, ...nearOnes(nearest, sensorMm), T - filterShiftMm].map((v) => Math.abs(v - T)).filter((d) => d <= 10);
  const half = Math.min(10, Math.max(1.5, tol * 2.5, ...reach.map((d) => d * 1.15 + 0.3)));
  return [T - half, T + half];
}

export function BudgetLoupe({ steps, sensorMm, targetMm: T, toleranceMm: tol, filterShiftMm, nearest, unit, hatch, inside }: Props) {
  const [ref, W] = useWidth<HTMLDivElement>();
  const near = nearOnes(nearest, sensorMm);
  const [lo, hi] = loupeRange({ sensorMm, targetMm: T, toleranceMm: tol, filterShiftMm, nearest });
  const pad = 16;
  const px = (W - 2 * pad) / (hi - lo);
  const x = (mm: number) => pad + (Math.min(hi, Math.max(lo, mm)) - lo) * px;
  const t = ticks(lo, hi, px, unit, 64);
  const mark = inside ? "var(--c-ok)" : "var(--c-bad)";
  const off = sensorMm < lo ? -1 : sensorMm > hi ? 1 : 0;
  const u = (mm: number) => (unit === "in" ? mm / MM_PER_INCH : mm);
  const d = unit === "in" ? 3 : 2;
  const err = sensorMm - T;
  const sx = x(sensorMm);
  const right = sx < W - 150;
  const B = T - filterShiftMm;

  return (
    <div ref={ref} className="mt-3 w-full">
      <p className="mb-1 text-xs font-medium text-muted">Close-up around the target, {tickLabel(lo, unit, 0.01)} to {tickLabel(hi, unit, 0.01)} {unit}</p>
      <svg width={W} height={92} viewBox={`0 0 ${W} 92`} className="block" aria-hidden>
        {steps.map((st, i) => st.startMm + st.lengthMm < lo || st.startMm > hi ? null : (
          <rect key={i} x={x(st.startMm)} y={16} width={Math.max(0.5, x(st.startMm + st.lengthMm) - x(st.startMm))} height={38}
            fill={SEGMENT_FILL[st.role]} stroke="var(--c-ink)" strokeOpacity={0.4} />
        ))}
        <rect x={x(T - tol)} y={16} width={x(T + tol) - x(T - tol)} height={38} fill="var(--c-ok)" fillOpacity={0.18} stroke="var(--c-ok)" strokeOpacity={0.8} strokeDasharray="3 2" />
        {filterShiftMm > 0 ? <rect x={x(B)} y={16} width={Math.max(1, x(T) - x(B))} height={8} fill={`url(#${hatch})`} /> : null}
        {filterShiftMm > 0 && B > lo ? <line x1={x(B)} x2={x(B)} y1={16} y2={54} stroke="var(--c-glass-ink)" strokeDasharray="3 2" /> : null}
        <line x1={x(T)} x2={x(T)} y1={12} y2={58} stroke="var(--c-ink)" strokeWidth={1.5} />
        {near.map((n) => n >= lo && n <= hi ? (
          <g key={n}>
            <line x1={x(n)} x2={x(n)} y1={16} y2={54} stroke="var(--c-muted)" strokeWidth={1.5} strokeDasharray="2 2" />
            <text x={x(n) + (n < T ? -4 : 4)} y={50} textAnchor={n < T ? "end" : "start"} fontSize="10" fill="var(--c-muted)" className="num">reachable {u(n).toFixed(d)}</text>
          </g>
        ) : null)}
        <RulerAxis x={x} from={pad} to={W - pad} y={54} ticks={t} unit={unit} major={7} />
        <text x={x(T)} y={88} textAnchor="middle" fontSize="10" fill="var(--c-ink)" className="num">target {u(T).toFixed(d)} · window {u(T - tol).toFixed(d)}–{u(T + tol).toFixed(d)}</text>
        {off ? (
          <text x={off < 0 ? pad : W - pad} y={11} textAnchor={off < 0 ? "start" : "end"} fontSize="11" fontWeight={600} fill={mark} className="num">
            {off < 0 ? "◀ " : ""}sensor at {u(sensorMm).toFixed(d)}, {signed(u(err), d)} {unit}{off > 0 ? " ▶" : ""}
          </text>
        ) : (
          <g>
            <line x1={sx} x2={sx} y1={10} y2={54} stroke={mark} strokeWidth={2.5} />
            <path d={`M${sx},12 l-6,-10 h12 z`} fill={mark} />
            <text x={sx + (right ? 9 : -9)} y={11} textAnchor={right ? "start" : "end"} fontSize="11" fontWeight={600} fill={mark} className="num">sensor {signed(u(err), d)} {unit}{inside ? "" : " — outside"}</text>
          </g>
        )}
      </svg>
    </div>
  );
}
