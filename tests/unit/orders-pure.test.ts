import { describe, expect, it } from "vitest";
import { parseStripeForm } from "@/lib/dev/stripe-fake";
import { formatMoney, inputToMinor, minorToInput, quoteTotal } from "@/lib/payments/money";
import { canPay, displayStatus, isExpired } from "@/lib/payments/status";

describe("money in the smallest unit", () => {
  it("reads what a shop types in its currency's own decimals", () => {
    expect(inputToMinor("12.5", "USD")).toBe(1250);
    expect(inputToMinor("12,05", "EUR")).toBe(1205);
    expect(inputToMinor("7", "USD")).toBe(700);
    expect(inputToMinor("1200", "JPY")).toBe(1200); // zero-decimal currency: whole yen
    for (const bad of ["", "-1", "1.234", "abc", "1e3", "12.5.0"]) expect(inputToMinor(bad, "USD")).toBeNull();
    expect(inputToMinor("12.5", "JPY")).toBeNull();
  });

  it("writes it back the same way, and formats for people", () => {
    expect(minorToInput(1250, "USD")).toBe("12.50");
    expect(minorToInput(1200, "JPY")).toBe("1200");
    expect(formatMoney(11300, "USD")).toBe("$113.00");
    expect(formatMoney(1200, "JPY")).toBe("¥1,200");
  });

  it("totals lines and shipping", () => {
    expect(quoteTotal([{ quantity: 2, unitPriceCents: 1250 }, { quantity: 0, unitPriceCents: 999 }, { quantity: 1, unitPriceCents: 7840 }], 750)).toBe(2 * 1250 + 7840 + 750);
  });
});

describe("quote status", () => {
  const past = new Date(Date.now() - 1000);
  const future = new Date(Date.now() + 86_400_000);
  it("an expired quote reads as expired and cannot be paid; an open payment can be resumed", () => {
    expect(isExpired({ status: "quoted", expiresAt: past })).toBe(true);
    expect(displayStatus({ status: "quoted", expiresAt: past })).toBe("Quote expired");
    expect(canPay({ status: "quoted", expiresAt: past })).toBe(false);
    expect(canPay({ status: "quoted", expiresAt: future })).toBe(true);
    expect(canPay({ status: "awaiting_payment", expiresAt: past })).toBe(true);
    expect(canPay({ status: "paid", expiresAt: future })).toBe(false);
    expect(isExpired({ status: "paid", expiresAt: past })).toBe(false);
  });
});

describe("the payment fake's form parser", () => {
  it("reads the SDK's bracket notation into nested objects", () => {
    const body = "mode=payment&line_items[0][quantity]=2&line_items[0][price_data][currency]=usd&line_items[0][price_data][unit_amount]=1250"
      + "&line_items[1][quantity]=1&metadata[quoteId]=q1&success_url=http%3A%2F%2Fx%2Fok%3Fs%3D%7BCHECKOUT_SESSION_ID%7D";
    expect(parseStripeForm(body)).toEqual({
      mode: "payment",
      line_items: { 0: { quantity: "2", price_data: { currency: "usd", unit_amount: "1250" } }, 1: { quantity: "1" } },
      metadata: { quoteId: "q1" },
      success_url: "http://x/ok?s={CHECKOUT_SESSION_ID}",
    });
  });
});

describe("parts still to buy for a build", () => {
  it("counts each connecting part of the chain and the telescope link, less what this buyer owns", async () => {
    const { partsToBuy } = await import("@/lib/payments/build-lines");
    const item = (slug: string) => ({ id: slug, slug, name: slug.toUpperCase(), maker: "", model: slug, kind: "spacer", front: null, rear: null, lengthMm: 1, adjustMm: null, clearApertureMm: null, weightG: null, priceCents: 100, owned: false });
    const result = {
      context: { items: { s5: item("s5"), s10: item("s10"), a1: item("a1"), cam: item("cam") } },
      telescopeLink: { solutions: [{ steps: [{ partId: "a1", role: "connector" }] }] },
    } as never;
    const chain = { steps: [{ partId: "s5", role: "connector" }, { partId: "s5", role: "connector" }, { partId: "s10~owned", role: "connector" }, { partId: "cam", role: "camera" }] } as never;
    expect(partsToBuy(result, chain, new Map([["s5", 1], ["s10", 1]]))).toEqual([
      { slug: "a1", name: "A1", count: 1 },
      { slug: "s5", name: "S5", count: 1 },
    ]);
  });
});
