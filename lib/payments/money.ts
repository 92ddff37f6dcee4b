// Money in the smallest currency unit (cents, pence, yen), as shops store it and the payment
// provider charges it. Zero-decimal currencies (JPY) are whole units.

export function minorDigits(currency: string): number {
  try {
    return new Intl.NumberFormat("en", { style: "currency", currency }).resolvedOptions().maximumFractionDigits ?? 2;
  } catch {
    return 2;
  }
}

export function formatMoney(minor: number | null | undefined, currency: string): string {
  if (minor === null || minor === undefined) return "—";
  try {
    return new Intl.NumberFormat("en-US", { style: "currency", currency }).format(minor / 10 ** minorDigits(currency));
  } catch {
    return `${(minor / 100).toFixed(2)} ${currency}`;
  }
}

/** "12.50" for an input box, in the currency's own decimals. */
export function minorToInput(minor: number, currency: string): string {
  const d = minorDigits(currency);
  return (minor / 10 ** d).toFixed(d);
}

/** "12.5" → 1250 (USD); null when it is not a non-negative amount with at most the currency's decimals. */
export function inputToMinor(text: string, currency: string): number | null {
  const d = minorDigits(currency);
  const m = text.trim().match(d ? new RegExp(`^(\\d{1,7})(?:[.,](\\d{0,${d}}))?$`) : /^(\d{1,9})$/);
  if (!m) return null;
  return Number(m[1]) * 10 ** d + Number((m[2] ?? "").padEnd(d, "0") || 0);
}

export type PricedLine = { quantity: number; unitPriceCents: number };

/** Σ quantity × unit price + shipping: the one place a quote's total is computed. */
export function quoteTotal(lines: PricedLine[], shippingCents: number): number {
  return lines.reduce((sum, l) => sum + l.quantity * l.unitPriceCents, 0) + shippingCents;
}
