import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { exportInventoryCsv, makerModelKey, previewInventoryCsv, type CatalogLookup } from "@/lib/shops/csv";

const part = (slug: string, name: string) => ({ id: `id-${slug}`, slug, name });
const catalog: CatalogLookup = {
  bySlug: new Map([["a-spacer", part("a-spacer", "Acme Spacer")], ["b-adapter", part("b-adapter", "Bolt Adapter")]]),
  byMakerModel: new Map([[makerModelKey("Bolt", "Adapter"), part("b-adapter", "Bolt Adapter")]]),
};
const HEADER = "catalog_slug,maker,model,sku,price_cents,currency,on_hand";

describe("inventory CSV preview", () => {
  it("matches by slug or by maker + model, and marks adds and updates", () => {
    const p = previewInventoryCsv(`\uFEFF${HEADER}\na-spacer,,,A-1,1200,usd,3\n,bolt,ADAPTER,B-1,900,EUR,0\n`, catalog, new Map([["id-a-spacer", { sku: "A-1", reserved: 0 }]]));
    expect(p.errors).toEqual([]);
    expect(p.rows.map((r) => [r.line, r.part?.slug, r.action, r.currency, r.priceCents, r.onHand])).toEqual([
      [2, "a-spacer", "update", "USD", 1200, 3], [3, "b-adapter", "add", "EUR", 900, 0],
    ]);
  });

  it("names each row's error", () => {
    const p = previewInventoryCsv([HEADER, "zzz,,,Z-1,1,USD,1", "a-spacer,,,A-1,-1,USD,1", "b-adapter,,,A-1,1,XXX,2.5"].join("\n"), catalog, new Map());
    expect(p.rows[0].errors).toEqual(['Unknown part "zzz" in the catalog']);
    expect(p.rows[1].errors).toEqual(["Price cannot be negative"]);
    expect(p.rows[2].errors).toEqual(expect.arrayContaining([expect.stringMatching(/ISO 4217/), "On hand is a whole number", "Duplicate SKU: also on line 3"]));
    expect(p.errorCount).toBe(3);
  });

  it("refuses stock below what is reserved, and a SKU another stocked part holds", () => {
    const current = new Map([["id-a-spacer", { sku: "A-1", reserved: 2 }], ["id-b-adapter", { sku: "B-9", reserved: 0 }]]);
    const p = previewInventoryCsv(`${HEADER}\na-spacer,,,A-1,1,USD,1\n`, catalog, current);
    expect(p.rows[0].errors).toEqual(["Stock 1 is below the 2 reserved for orders"]);
    const q = previewInventoryCsv(`${HEADER}\na-spacer,,,B-9,1,USD,5\n`, catalog, current);
    expect(q.rows[0].errors).toEqual(["Duplicate SKU: another stocked part already uses it"]);
  });

  it("explains wrong columns, empty files and binary data as whole-file errors", () => {
    expect(previewInventoryCsv("part,qty\nx,1\n", catalog, new Map()).errors[0]).toMatch(/missing sku, price_cents, currency, on_hand; unknown "part", "qty"/);
    expect(previewInventoryCsv(`${HEADER}\n`, catalog, new Map()).errors[0]).toMatch(/no rows/);
    expect(previewInventoryCsv("a\u0000b", catalog, new Map()).errors[0]).toMatch(/binary/);
  });
});

describe("inventory CSV export", () => {
  it("neutralises cells that a spreadsheet would run as a formula", () => {
    // OWASP "CSV Injection": cells starting with = + - @ (and tab, CR) are formulas in spreadsheets.
    const csv = exportInventoryCsv([
      { slug: "s", maker: "=HYPERLINK(\"http://x\")", model: "+1+2", sku: "-3", priceCents: 100, currency: "USD", onHand: 1 },
      { slug: "t", maker: "@SUM(A1)", model: "\tTab", sku: "OK-1", priceCents: 5, currency: "GBP", onHand: 0 },
    ]);
    const rows = Papa.parse<string[]>(csv).data;
    expect(rows[0]).toEqual(["catalog_slug", "maker", "model", "sku", "price_cents", "currency", "on_hand"]);
    expect(rows[1].slice(1, 4)).toEqual(["'=HYPERLINK(\"http://x\")", "'+1+2", "'-3"]);
    expect(rows[2].slice(1, 4)).toEqual(["'@SUM(A1)", "'\tTab", "OK-1"]);
    for (const row of rows.slice(1)) for (const cell of row) expect(cell).not.toMatch(/^[=+\-@\t\r]/);
  });
});
