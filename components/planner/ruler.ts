// Tick spacing for a ruler in millimetres or inches: major ticks at least `minPx` apart.
// Hand-written, not d3-scale's ticks: those step in 1-2-5 only and aim at a tick count, while a
// ruler here also steps 25 mm / 0.25 in and chooses by the pixels between ticks.
import type { LengthUnit } from "@/lib/units";
import { MM_PER_INCH } from "@/lib/optics";

const MM_STEPS = [0.1, 0.2, 0.25, 0.5, 1, 2, 5, 10, 20, 25, 50, 100];
const IN_STEPS = [0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 0.5, 1, 2, 5];

export type Ticks = { major: number[]; minor: number[]; step: number };

/** Ticks (in mm) between `fromMm` and `toMm`; `step` is in the display unit. */
export function ticks(fromMm: number, toMm: number, pxPerMm: number, unit: LengthUnit, minPx = 56): Ticks {
  const perUnit = unit === "in" ? MM_PER_INCH : 1;
  const steps = unit === "in" ? IN_STEPS : MM_STEPS;
  const step = steps.find((s) => s * perUnit * pxPerMm >= minPx) ?? steps[steps.length - 1];
  const stepMm = step * perUnit;
  const divisions = String(step).startsWith("2") && !String(step).startsWith("25") ? 2 : 5;
  const minorMm = stepMm / divisions;
  const major: number[] = [];
  const minor: number[] = [];
  const first = Math.ceil(fromMm / minorMm - 1e-9);
  for (let k = first; k * minorMm <= toMm + 1e-9; k++) {
    const v = k * minorMm;
    (k % divisions === 0 ? major : minor).push(v);
  }
  return { major, minor, step };
}

export function tickLabel(mm: number, unit: LengthUnit, step: number): string {
  const value = unit === "in" ? mm / MM_PER_INCH : mm;
  const decimals = Math.max(0, (String(step).split(".")[1] ?? "").length);
  return value.toFixed(decimals);
}
