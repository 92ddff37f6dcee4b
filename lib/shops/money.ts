// Money in a shop's own currency: whole numbers in the smallest unit (cents, pence, yen).

const formatters = new Map<string, Intl.NumberFormat>();

function formatter(currency: string): Intl.NumberFormat {
  let f = formatters.get(currency);
  if (!f) { f = new Intl.NumberFormat("en-US", { style: "currency", currency }); formatters.set(currency, f); }
  return f;
}

/** Digits after the decimal point for a currency (2 for USD, 0 for JPY), from Intl. */
export function minorDigits(currency: string): number {
  return formatter(currency).resolvedOptions().maximumFractionDigits ?? 2;
}

export function formatMoney(minor: number | null | undefined, currency: string): string {
  if (minor === null || minor === undefined) return "—";
  return formatter(currency).format(minor / 10 ** minorDigits(currency));
}
