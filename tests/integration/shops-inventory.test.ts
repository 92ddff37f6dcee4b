import { beforeAll, describe, expect, it } from "vitest";
import { Client, signedIn } from "../support/http";
import { bearer, inventoryOf, newShop, postCsv, put } from "./shops-support";

const S5 = "tarrant-machining-m48-spacer-5-mm";
const S10 = "tarrant-machining-m48-spacer-10-mm";
const HEADER = "catalog_slug,maker,model,sku,price_cents,currency,on_hand";

let shop: Awaited<ReturnType<typeof newShop>>;
let owner: Client;
const path = () => `/api/v1/shops/${shop.slug}/inventory`;

beforeAll(async () => {
  shop = await newShop("inv");
  owner = shop.owner.client;
});

describe("inventory API", () => {
  it("adds and updates lines, and GET gives available = on hand − reserved", async () => {
    const res = await put(owner, path(), { items: [
      { part: S5, sku: "M48-5", priceCents: 3600, currency: "eur", onHand: 4 },
      { part: S10, sku: "M48-10", priceCents: 5800, currency: "EUR", onHand: 0 },
    ] });
    expect(res.status).toBe(200);
    const items = await inventoryOf(owner, shop.slug);
    expect(items.map((i) => [i.slug, i.sku, i.priceCents, i.currency, i.onHand, i.available])).toEqual([
      [S10, "M48-10", 5800, "EUR", 0, 0], [S5, "M48-5", 3600, "EUR", 4, 4],
    ]);
    expect((await put(owner, path(), { items: [{ part: S10, sku: "M48-10", priceCents: 5900, currency: "EUR", onHand: 2 }] })).status).toBe(200);
    expect((await inventoryOf(owner, shop.slug)).find((i) => i.slug === S10)).toMatchObject({ priceCents: 5900, onHand: 2 });
  });

  it("answers bad lines with 400 and field errors, writing none of the lines", async () => {
    const before = await inventoryOf(owner, shop.slug);
    const res = await put(owner, path(), { items: [
      { part: S5, sku: "M48-5", priceCents: 1, currency: "EUR", onHand: 9 },
      { part: S10, sku: "=cmd", priceCents: -5, currency: "EURO", onHand: 1.5 },
    ] });
    expect(res.status).toBe(400);
    const { error } = await res.json();
    expect(Object.keys(error.fields).sort()).toEqual(["items.1.currency", "items.1.onHand", "items.1.priceCents", "items.1.sku"]);
    const unknown = await put(owner, path(), { items: [{ part: "no-such-part", sku: "X1", priceCents: 1, currency: "EUR", onHand: 1 }] });
    expect(unknown.status).toBe(400);
    expect((await unknown.json()).error.fields["items.0.part"][0]).toMatch(/no-such-part/);
    const dupSku = await put(owner, path(), { items: [{ part: S10, sku: "M48-5", priceCents: 1, currency: "EUR", onHand: 1 }] });
    expect(dupSku.status).toBe(409);
    expect(await inventoryOf(owner, shop.slug)).toEqual(before);
  });
});

describe("CSV import", () => {
  it("previews without writing, then applies every row on confirm", async () => {
    const csv = `${HEADER}\n${S5},,,M48-5,3500,EUR,6\n,Tarrant Machining,M48 Spacer 20 mm,M48-20,9000,EUR,3\n`;
    const before = await inventoryOf(owner, shop.slug);
    const preview = await postCsv(owner, shop.slug, csv);
    expect(preview.status).toBe(200);
    const body = await preview.json();
    expect(body.applied).toBe(false);
    expect(body.rows.map((r: { part: { slug: string } | null; action: string }) => [r.part?.slug, r.action])).toEqual([[S5, "update"], ["tarrant-machining-m48-spacer-20-mm", "add"]]);
    expect(await inventoryOf(owner, shop.slug)).toEqual(before);

    const done = await postCsv(owner, shop.slug, csv, true);
    expect(done.status).toBe(200);
    expect((await done.json()).applied).toBe(true);
    const after = await inventoryOf(owner, shop.slug);
    expect(after.find((i) => i.slug === S5)).toMatchObject({ onHand: 6, priceCents: 3500 });
    expect(after.find((i) => i.slug === "tarrant-machining-m48-spacer-20-mm")).toMatchObject({ sku: "M48-20", onHand: 3 });
  });

  it("names each bad row's problem and imports nothing when any row is wrong", async () => {
    const before = await inventoryOf(owner, shop.slug);
    const csv = [HEADER,
      `${S5},,,M48-5,3400,EUR,7`,                  // fine on its own
      "no-such-part,,,Z-1,100,EUR,1",              // unknown part
      `${S10},,,M48-10,5900,EUR,-2`,               // negative stock
      "tarrant-machining-m48-spacer-30-mm,,,M48-30,12.5,EUR,1", // bad price
      "tarrant-machining-m48-spacer-40-mm,,,M48-5,100,EUR,1",   // duplicate SKU
    ].join("\n");
    const body = await (await postCsv(owner, shop.slug, csv)).json();
    const errs = body.rows.map((r: { errors: string[] }) => r.errors.join(" | "));
    expect(errs[0]).toBe("");
    expect(errs[1]).toMatch(/Unknown part "no-such-part"/);
    expect(errs[2]).toMatch(/cannot be negative/);
    expect(errs[3]).toMatch(/Price is a whole number/);
    expect(errs[4]).toMatch(/Duplicate SKU/);
    expect(body.errorCount).toBe(4);
    const confirm = await postCsv(owner, shop.slug, csv, true);
    expect(confirm.status).toBe(400);
    expect((await confirm.json()).error.message).toMatch(/nothing was imported/);
    expect(await inventoryOf(owner, shop.slug)).toEqual(before);
  });

  it("refuses a 10 MB junk file, wrong columns and hostile content, changing nothing", async () => {
    const before = await inventoryOf(owner, shop.slug);
    const junk = new Uint8Array(new ArrayBuffer(10 * 1024 * 1024)).map((_, i) => (i * 7919) % 251);
    const big = await postCsv(owner, shop.slug, junk, true);
    expect(big.status).toBe(413);
    expect((await big.json()).error.message).toMatch(/5 MB/);

    const wrong = await postCsv(owner, shop.slug, "name,qty,cost\nspacer,1,2\n", true);
    expect(wrong.status).toBe(400);
    expect((await wrong.json()).error.message).toMatch(/missing sku, price_cents, currency, on_hand/);

    const binary = await postCsv(owner, shop.slug, new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0, 0, 0xff, 0xfe]), true);
    expect(binary.status).toBe(400);

    const hostile = [HEADER,
      `${S5},,,"=HYPERLINK(""http://evil.example"",""x"")",1,EUR,1`,
      `"<script>alert(1)</script>",,,OK-1,1,EUR,1`,
      `${S10},,,"M48-10\nsecond line",1,EUR,1`,
      `${S10},,,OK-2,1,EUR,99999999999`,
    ].join("\n");
    const h = await postCsv(owner, shop.slug, hostile, true);
    expect(h.status).toBe(400);
    const preview = await (await postCsv(owner, shop.slug, hostile)).json();
    expect(preview.rows.every((r: { errors: string[] }) => r.errors.length > 0)).toBe(true);
    expect(await inventoryOf(owner, shop.slug)).toEqual(before);
  });

  it("exports the stock as CSV that imports back unchanged", async () => {
    const res = await owner.get(`${path()}/export`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/text\/csv/);
    const csv = await res.text();
    expect(csv.split("\r\n")[0].replace(/^\uFEFF/, "")).toBe(HEADER);
    const back = await (await postCsv(owner, shop.slug, csv)).json();
    expect(back.errorCount).toBe(0);
    expect(back.rows.every((r: { action: string }) => r.action === "update")).toBe(true);
  });
});

describe("shop API keys", () => {
  it("work for their own shop's stock only, and stop when revoked", async () => {
    const made = await owner.post(`/api/v1/shops/${shop.slug}/api-keys`, { name: "Counter till" });
    expect(made.status).toBe(201);
    const { key } = await made.json();
    expect(key.secret).toMatch(/^tyk_/);
    const listed = await (await owner.get(`/api/v1/shops/${shop.slug}/api-keys`)).json();
    expect(JSON.stringify(listed)).not.toContain(key.secret);

    const system = new Client(); // no session at all, only the key
    expect((await inventoryOf(system, shop.slug, bearer(key.secret))).length).toBeGreaterThan(0);
    const write = await put(system, path(), { items: [{ part: S5, sku: "M48-5", priceCents: 3450, currency: "EUR", onHand: 5 }] }, bearer(key.secret));
    expect(write.status).toBe(200);

    // Another shop's stock: refused for reading and writing.
    for (const other of ["lantern-row-optics", "kilnworth-astro-supply"]) {
      expect((await system.request(`/api/v1/shops/${other}/inventory`, { headers: bearer(key.secret) })).status).toBe(403);
      expect((await put(system, `/api/v1/shops/${other}/inventory`, { items: [] }, bearer(key.secret))).status).toBe(403);
    }
    // A key never reaches the owner-only or member routes.
    expect((await system.request(`/api/v1/shops/${shop.slug}/api-keys`, { headers: bearer(key.secret) })).status).toBe(401);
    expect((await system.request(path(), { headers: bearer("tyk_made-up") })).status).toBe(401);
    expect((await system.request(path(), { headers: bearer("not-a-key") })).status).toBe(401);

    expect((await owner.delete(`/api/v1/shops/${shop.slug}/api-keys/${key.id}`)).status).toBe(200);
    expect((await system.request(path(), { headers: bearer(key.secret) })).status).toBe(401);
  });

  it("cannot be revoked by the owner of another shop", async () => {
    const { key } = await (await owner.post(`/api/v1/shops/${shop.slug}/api-keys`, { name: "Second" })).json();
    const lantern = await signedIn("shop@trainyard.test");
    expect((await lantern.delete(`/api/v1/shops/lantern-row-optics/api-keys/${key.id}`)).status).toBe(404);
    expect((await lantern.delete(`/api/v1/shops/${shop.slug}/api-keys/${key.id}`)).status).toBe(403);
    expect((await inventoryOf(new Client(), shop.slug, bearer(key.secret))).length).toBeGreaterThan(0);
  });
});
