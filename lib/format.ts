// Display helpers shared by pages (no framework imports).
export const KIND_LABELS: Record<string, string> = {
  optics: "Optics", camera: "Camera", adapter: "Adapter", spacer: "Spacer", extension: "Extension",
  "filter-wheel": "Filter wheel", "filter-drawer": "Filter drawer", oag: "Off-axis guider",
  "tilt-plate": "Tilt plate", diagonal: "Diagonal", other: "Other",
};

/** Catalog list prices are kept in one currency (cents); set NEXT_PUBLIC_CURRENCY to change it. */
export const CURRENCY = process.env.NEXT_PUBLIC_CURRENCY ?? "USD";
const money = new Intl.NumberFormat("en-US", { style: "currency", currency: CURRENCY });

export function formatPrice(cents: number | null | undefined): string {
  return cents === null || cents === undefined ? "—" : money.format(cents / 100);
}

export function formatGrams(g: number | null | undefined): string {
  return g === null || g === undefined ? "—" : g >= 1000 ? `${(g / 1000).toFixed(2)} kg` : `${Math.round(g)} g`;
}

const andList = new Intl.ListFormat("en-GB", { style: "long", type: "conjunction" });

/** "A, B and C" (British: no comma before "and"). lib/solver has its own listAnd: it imports nothing from outside. */
export function listAnd(items: readonly string[]): string {
  return andList.format(items);
}

const dayFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

/** "5 Dec 2026" (UTC, so the server's and the browser's pages agree); "—" for no date. */
export function formatDay(d: Date | string | null | undefined): string {
  return d ? dayFormat.format(new Date(d)) : "—";
}
