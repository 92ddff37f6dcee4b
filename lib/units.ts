// Display helpers for lengths. Everything inside Trainyard is millimetres; the UI may also
// show inches. Lengths display to 0.1 mm.

import { MM_PER_INCH } from "./optics";

export type LengthUnit = "mm" | "in";

function fixed(value: number, digits: number): string {
  const text = value.toFixed(digits);
  // "-0.0" reads like a mistake: a length that rounds to zero is zero.
  return Number(text) === 0 ? (0).toFixed(digits) : text;
}

/** "55.7 mm" — to 0.1 mm unless told otherwise; "—" when there is no value. */
export function formatMm(mm: number | null | undefined, digits = 1): string {
  if (mm === null || mm === undefined || !Number.isFinite(mm)) return "—";
  return `${fixed(mm, digits)} mm`;
}

/** A length in the reader's unit: "55.7 mm" or "2.193 in" (0.001 in ≈ 0.03 mm). */
export function formatLength(mm: number, unit: LengthUnit = "mm"): string {
  if (unit === "mm") return formatMm(mm);
  if (!Number.isFinite(mm)) return "—";
  return `${fixed(mm / MM_PER_INCH, 3)} in`;
}
