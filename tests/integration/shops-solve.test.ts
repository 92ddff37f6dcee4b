import { beforeAll, describe, expect, it } from "vitest";
import { Client, signedIn } from "../support/http";
import { flagshipWith, newShop, put, sql } from "./shops-support";

// The flagship train needs about 18 mm of M48 spacers between flattener and wheel
// (55 + 0.67 mm target, wheel 20 + camera 17.5 mm): 15 + 3 mm, or 16.5 + 2 mm.
const S15 = "tarrant-machining-m48-spacer-15-mm";
const S3 = "tarrant-machining-m48-spacer-3-mm";
const S16 = "tarrant-machining-m48-spacer-16-5-mm";
const S2 = "tarrant-machining-m48-spacer-2-mm";
const CONNECTOR = /spacer|adapter|extension/;

let shop: Awaited<ReturnType<typeof newShop>>;
const solve = async (body: unknown, c = new Client()) => { const r = await c.post("/api/v1/solve", body); return { status: r.status, body: await r.json() }; };
const connectors = (chain: { steps: { partId: string }[] }) => chain.steps.map((s) => s.partId).filter((id) => CONNECTOR.test(id));

beforeAll(async () => {
  shop = await newShop("solve");
  const res = await put(shop.owner.client, `/api/v1/shops/${shop.slug}/inventory`, { items: [
    { part: S15, sku: "S15", priceCents: 1111, currency: "JPY", onHand: 1 },
    { part: S3, sku: "S3", priceCents: 222, currency: "JPY", onHand: 1 },
    { part: S16, sku: "S16", priceCents: 3333, currency: "JPY", onHand: 2 },
    { part: S2, sku: "S2", priceCents: 444, currency: "JPY", onHand: 1 },
  ] });
  expect(res.status).toBe(200);
});

describe("solving from a shop's stock", () => {
  it("uses only parts the shop has available, at its prices", async () => {
    const { status, body } = await solve(flagshipWith({ kind: "shop", shop: shop.slug }));
    expect(status).toBe(200);
    expect(body.status).toBe("ok");
    expect(body.context.shop).toMatchObject({ slug: shop.slug, currency: "USD" });
    const stocked = new Set([S15, S3, S16, S2]);
    const price: Record<string, number> = { [S15]: 1111, [S3]: 222, [S16]: 3333, [S2]: 444 };
    for (const chain of body.solutions) {
      const used = connectors(chain);
      for (const id of used) expect(stocked.has(id), id).toBe(true);
      // Quantities honoured: one of each, except two of the 16.5 mm.
      for (const id of [S15, S3, S2]) expect(used.filter((u: string) => u === id).length).toBeLessThanOrEqual(1);
      expect(chain.priceCents).toBe(used.reduce((s: number, id: string) => s + price[id], 0));
      for (const id of used) expect(body.context.items[id].priceCents).toBe(price[id]);
    }
  });

  it("leaves out what is reserved (available = on hand − reserved)", async () => {
    // Reserving is the orders flow's job; here the reservation is written directly.
    await sql(`update shop_inventory set on_hand = 1, reserved = 1 where sku in ('S15', 'S16') and organization_id = (select id from organization where slug = $1)`, [shop.slug]);
    try {
      const { body } = await solve(flagshipWith({ kind: "shop", shop: shop.slug }));
      for (const chain of body.solutions) {
        expect(connectors(chain)).not.toContain(S15);
        expect(connectors(chain)).not.toContain(S16);
      }
    } finally {
      await sql(`update shop_inventory set reserved = 0, on_hand = case when sku = 'S16' then 2 else 1 end where sku in ('S15', 'S16') and organization_id = (select id from organization where slug = $1)`, [shop.slug]);
    }
  });

  it("counts what the member owns first, then the shop", async () => {
    const member = await signedIn("member@trainyard.test");
    const { body } = await solve(flagshipWith({ kind: "shop", shop: shop.slug, owned: true }), member);
    expect(body.status).toBe("ok");
    // The member's own spacers (seed/gear.ts) join the pool, free.
    const owned = Object.values(body.context.items as Record<string, { id: string; owned: boolean; priceCents: number }>).filter((i) => i.owned);
    expect(owned.map((i) => i.id)).toContain("tarrant-machining-m48-spacer-10-mm~owned");
    for (const i of owned) expect(i.priceCents).toBe(0);
    const plain = await solve(flagshipWith({ kind: "shop", shop: shop.slug }));
    expect(body.solutions.length).toBeGreaterThanOrEqual(plain.body.solutions.length);
    for (const chain of body.solutions) for (const id of connectors(chain)) expect(id.endsWith("~owned") || [S15, S3, S16, S2].includes(id)).toBe(true);
    expect((await solve(flagshipWith({ kind: "shop", shop: shop.slug, owned: true }))).status).toBe(401);
  });

  it("answers { kind: 'shops' } with the best chain per shop", async () => {
    const { status, body } = await solve(flagshipWith({ kind: "shops" }));
    expect(status).toBe(200);
    const mine = body.shops.find((s: { shop: { slug: string } }) => s.shop.slug === shop.slug);
    expect(mine.status).toBe("ok");
    expect(mine.totalCents).toBe(connectors(mine.chain).reduce((s: number, id: string) => s + mine.items[id].priceCents, 0));
    const lantern = body.shops.find((s: { shop: { slug: string } }) => s.shop.slug === "lantern-row-optics");
    expect(lantern.shop.currency).toBe("USD");
    // Answerable shops come first.
    const firstBad = body.shops.findIndex((s: { status: string }) => s.status !== "ok");
    if (firstBad >= 0) expect(body.shops.slice(firstBad).every((s: { status: string }) => s.status !== "ok")).toBe(true);
  });
});

describe("where to buy", () => {
  it("totals each shop's offer and names what it lacks", async () => {
    const res = await new Client().post("/api/v1/shops/where-to-buy", { parts: [{ slug: S15, quantity: 1 }, { slug: S3, quantity: 1 }, { slug: S16, quantity: 3 }] });
    expect(res.status).toBe(200);
    const { offers } = await res.json();
    const mine = offers.find((o: { shop: { slug: string } }) => o.shop.slug === shop.slug);
    expect(mine.complete).toBe(false);
    expect(mine.totals).toEqual([{ currency: "JPY", cents: 1111 + 222 }]);
    expect(mine.lacks).toEqual([{ slug: S16, name: "Tarrant Machining M48 Spacer 16.5 mm", needed: 3, available: 2 }]);
    expect((await new Client().post("/api/v1/shops/where-to-buy", { parts: [] })).status).toBe(400);
  });

  it("lists the shops that stock a part on its page", async () => {
    const html = await (await new Client().get(`/parts/${S15}`)).text();
    expect(html).toContain("In stock at");
    expect(html).toContain("Kilnworth Astro Supply");
    expect(html).toContain("Test Shop solve");
  });
});

describe("what to stock next", () => {
  it("ranks the catalog parts that would have answered the most unanswered solves", async () => {
    const next = await newShop("next");
    // Stock only a 15 mm spacer: the flagship train then needs a 3 mm one too (or other lengths).
    await put(next.owner.client, `/api/v1/shops/${next.slug}/inventory`, { items: [{ part: S15, sku: "S15", priceCents: 100, currency: "USD", onHand: 5 }] });
    for (let i = 0; i < 3; i++) {
      const { body } = await solve(flagshipWith({ kind: "shop", shop: next.slug }));
      expect(body.status).not.toBe("ok");
    }
    const res = await next.owner.client.get(`/api/v1/shops/${next.slug}/stock-next`);
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.total).toBe(3);
    expect(body.unanswered).toBe(3);
    const top = body.suggestions[0];
    expect(top.completes).toBe(3);
    expect(top.needed).toBe(3);
    expect(top.part.kind).toMatch(/spacer|adapter|extension/);
    // The log keeps no one's identity: its columns are the shop, the outcome, parts and time.
    const cols = await sql<{ column_name: string }>(`select column_name from information_schema.columns where table_name = 'shop_solve_log' order by 1`);
    expect(cols.map((c) => c.column_name)).toEqual(["created_at", "id", "missing_part_ids", "organization_id", "outcome"]);
  });
});
