import { describe, expect, it } from "vitest";
import { apiKeyFrom, hashApiKey, newApiKey } from "@/lib/shops/api-key";
import { formatMoney, minorDigits } from "@/lib/shops/money";
import { suggestStock } from "@/lib/shops/stock-next";
import { whereToBuy, type ShopStock } from "@/lib/shops/where-to-buy";

const stock = (slug: string, currency: string, lines: [string, number, number][]): ShopStock => ({
  slug, name: slug, currency, lines: new Map(lines.map(([s, priceCents, available]) => [s, { slug: s, priceCents, currency, available }])),
});

describe("where to buy", () => {
  it("totals each shop's offer in its currency and lists what it lacks, complete shops first", () => {
    const needs = [{ slug: "m48-15", name: "M48 15 mm", quantity: 1 }, { slug: "m48-3", name: "M48 3 mm", quantity: 2 }];
    const offers = whereToBuy(needs, [
      stock("alpha", "EUR", [["m48-15", 7000, 4], ["m48-3", 2000, 1]]),
      stock("bravo", "USD", [["m48-15", 8250, 1], ["m48-3", 2850, 5]]),
      stock("charlie", "GBP", [["other", 1, 1]]),
    ]);
    expect(offers.map((o) => o.shop.slug)).toEqual(["bravo", "alpha"]); // charlie has none of them
    expect(offers[0]).toMatchObject({ complete: true, totals: [{ currency: "USD", cents: 8250 + 2 * 2850 }], lacks: [] });
    expect(offers[1]).toMatchObject({ complete: false, totals: [{ currency: "EUR", cents: 7000 }], lacks: [{ slug: "m48-3", needed: 2, available: 1 }] });
  });
});

describe("what to stock next", () => {
  it("picks parts greedily by how many unanswered solves they complete", () => {
    const solves = [
      { outcome: "ok" as const, missingPartIds: [] },
      { outcome: "short" as const, missingPartIds: ["x"] },
      { outcome: "short" as const, missingPartIds: ["x"] },
      { outcome: "short" as const, missingPartIds: ["y", "z"] },
      { outcome: "short" as const, missingPartIds: ["y"] },
      { outcome: "short" as const, missingPartIds: ["z", "x"] },
      { outcome: "none" as const, missingPartIds: [] },
    ];
    const r = suggestStock(solves);
    expect(r.total).toBe(7);
    expect(r.unanswered).toBe(6);
    // x completes 2 alone; then y completes 1 more; then z completes the last two (y+z, z+x).
    expect(r.suggestions).toEqual([
      { partId: "x", needed: 3, completes: 2 },
      { partId: "y", needed: 2, completes: 1 },
      { partId: "z", needed: 2, completes: 2 },
    ]);
  });

  it("suggests nothing when every solve was answered", () => {
    expect(suggestStock([{ outcome: "ok", missingPartIds: [] }]).suggestions).toEqual([]);
  });
});

describe("shop API keys and money", () => {
  it("makes random keys, keeps only a hash, and reads them from the Authorization header", () => {
    const a = newApiKey(), b = newApiKey();
    expect(a.key).not.toBe(b.key);
    expect(a.hash).toBe(hashApiKey(a.key));
    expect(a.hash).not.toContain(a.key.slice(4, 20));
    expect(apiKeyFrom(new Headers({ authorization: `Bearer ${a.key}` }))).toBe(a.key);
    expect(apiKeyFrom(new Headers({ authorization: "Bearer something-else" }))).toBeNull();
  });

  it("formats the smallest unit of each currency (ISO 4217 minor units via Intl)", () => {
    expect(minorDigits("USD")).toBe(2);
    expect(minorDigits("JPY")).toBe(0);
    expect(formatMoney(8250, "USD")).toBe("$82.50");
    expect(formatMoney(8250, "JPY")).toBe("¥8,250");
    expect(formatMoney(1999, "GBP")).toBe("£19.99");
  });
});
