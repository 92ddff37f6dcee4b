// The ruler's line and ticks inside an SVG, shared by the budget strip and its close-up.
import type { LengthUnit } from "@/lib/units";
import { tickLabel, type Ticks } from "./ruler";

/** The axis along `y`, minor ticks 4 units down, major ones `major` down with their labels below. */
export function RulerAxis({ x, from, to, y, ticks: t, unit, major = 8 }: {
  /** Millimetres to the SVG's x. */
  x: (mm: number) => number; from: number; to: number; y: number; ticks: Ticks; unit: LengthUnit; major?: number;
}) {
  return (
    <>
      <line x1={from} x2={to} y1={y} y2={y} stroke="var(--c-ink)" strokeOpacity={0.7} />
      {t.minor.map((v) => <line key={`m${v}`} x1={x(v)} x2={x(v)} y1={y} y2={y + 4} stroke="var(--c-muted)" />)}
      {t.major.map((v) => (
        <g key={`M${v}`}>
          <line x1={x(v)} x2={x(v)} y1={y} y2={y + major} stroke="var(--c-ink)" strokeOpacity={0.8} />
          <text x={x(v)} y={y + 19} textAnchor="middle" fontSize="10" fill="var(--c-text)" className="num">{tickLabel(v, unit, t.step)}</text>
        </g>
      ))}
    </>
  );
}
