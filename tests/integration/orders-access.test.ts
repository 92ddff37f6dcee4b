// Who may do what with a quote or an order: the buyer, another buyer, the shop's staff,
// another shop's owner, and a signed-out visitor, for every quote and order route and page.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { TEST_CARDS } from "@/lib/dev/stripe-fake";
import { Client } from "../support/http";
import { saveBuild } from "./builds-support";
import { addMember, answer, flagshipBuild, makeShop, makeUser, payOnFake, pool, requestQuote, stock, type QuoteJson } from "./orders-support";

type Actor = "buyer" | "otherBuyer" | "staff" | "otherShop" | "visitor";
const actors = {} as Record<Actor, Client>;
let shop: { id: string; slug: string };
let other: { id: string; slug: string };
let build: { slug: string; connectors: string[] };

beforeAll(async () => {
  actors.buyer = await new Client().signIn("member@trainyard.test");
  actors.otherBuyer = (await makeUser("other-buyer")).client;
  const owner = await makeUser("access-owner");
  const staff = await makeUser("access-staff");
  const rival = await makeUser("rival-owner");
  shop = await makeShop("Access Test Optics", owner.id);
  await addMember(shop.id, staff.id, "staff");
  other = await makeShop("Rival Test Optics", rival.id);
  actors.staff = staff.client;
  actors.otherShop = rival.client;
  actors.visitor = new Client();
  build = await flagshipBuild(actors.buyer);
  await stock(shop.id, build.connectors, 50);
  await stock(other.id, build.connectors, 50);
});
afterAll(async () => { await pool.end(); });

async function quotedQuote(): Promise<QuoteJson> {
  const q = await requestQuote(actors.buyer, build.slug, shop.slug);
  expect((await answer(actors.staff, q)).status).toBe(200);
  return q;
}

async function paidOrder(): Promise<QuoteJson> {
  const q = await quotedQuote();
  const { url } = await (await actors.buyer.post(`/api/v1/quotes/${q.id}/checkout`)).json() as { url: string };
  expect((await payOnFake(url, TEST_CARDS.succeeds)).status).toBe(303);
  return q;
}

type Call = (c: Client, q: QuoteJson) => Promise<Response>;
/** Each route, the status each actor gets; the allowed actor is tried last, on the same quote. */
const routes: { name: string; state: () => Promise<QuoteJson>; call: Call; expect: Record<Actor, number> }[] = [
  { name: "GET /api/v1/quotes/[id]", state: quotedQuote, call: (c, q) => c.get(`/api/v1/quotes/${q.id}`),
    expect: { visitor: 401, otherBuyer: 404, otherShop: 404, buyer: 200, staff: 200 } },
  { name: "POST /api/v1/quotes/[id]/answer", state: quotedQuote, call: (c, q) => answer(c, q),
    expect: { visitor: 401, otherBuyer: 404, otherShop: 404, buyer: 403, staff: 200 } },
  { name: "POST /api/v1/quotes/[id]/checkout", state: quotedQuote, call: (c, q) => c.post(`/api/v1/quotes/${q.id}/checkout`),
    expect: { visitor: 401, otherBuyer: 404, otherShop: 404, staff: 403, buyer: 201 } },
  { name: "DELETE /api/v1/quotes/[id]/checkout", state: async () => { const q = await quotedQuote(); await actors.buyer.post(`/api/v1/quotes/${q.id}/checkout`); return q; },
    call: (c, q) => c.delete(`/api/v1/quotes/${q.id}/checkout`), expect: { visitor: 401, otherBuyer: 404, otherShop: 404, staff: 403, buyer: 200 } },
  { name: "POST /api/v1/quotes/[id]/cancel (buyer withdraws)", state: quotedQuote, call: (c, q) => c.post(`/api/v1/quotes/${q.id}/cancel`, {}),
    expect: { visitor: 401, otherBuyer: 404, otherShop: 404, buyer: 200, staff: 409 } },
  { name: "POST /api/v1/quotes/[id]/cancel (shop declines)", state: quotedQuote, call: (c, q) => c.post(`/api/v1/quotes/${q.id}/cancel`, { reason: "Out of M48 stock" }),
    expect: { visitor: 401, otherBuyer: 404, otherShop: 404, staff: 200, buyer: 409 } },
  { name: "POST /api/v1/orders/[id]/ship", state: paidOrder, call: (c, q) => c.post(`/api/v1/orders/${q.id}/ship`, { tracking: "Hand delivery" }),
    expect: { visitor: 401, otherBuyer: 404, otherShop: 404, buyer: 403, staff: 200 } },
  { name: "POST /api/v1/orders/[id]/refund", state: paidOrder, call: (c, q) => c.post(`/api/v1/orders/${q.id}/refund`, {}),
    expect: { visitor: 401, otherBuyer: 404, otherShop: 404, buyer: 403, staff: 200 } },
];

describe("quote and order routes", () => {
  for (const r of routes) {
    it(`${r.name}: ${Object.entries(r.expect).map(([a, s]) => `${a} ${s}`).join(", ")}`, async () => {
      const q = await r.state();
      const got: Record<string, number> = {};
      for (const actor of Object.keys(r.expect) as Actor[]) got[actor] = (await r.call(actors[actor], q)).status;
      expect(got).toEqual(r.expect);
    });
  }

  it("lists: each buyer sees only their own quotes, each shop only its own orders", async () => {
    const q = await quotedQuote();
    const ids = async (c: Client, path: string) => ((await (await c.get(path)).json()) as { items: { id: string }[] }).items.map((i) => i.id);
    expect(await ids(actors.buyer, "/api/v1/quotes")).toContain(q.id);
    expect(await ids(actors.otherBuyer, "/api/v1/quotes")).not.toContain(q.id);
    expect(await ids(actors.staff, `/api/v1/orders?shop=${shop.slug}`)).toContain(q.id);
    expect(await ids(actors.otherShop, `/api/v1/orders?shop=${other.slug}`)).not.toContain(q.id);
    const status = async (c: Client) => (await c.get(`/api/v1/orders?shop=${shop.slug}`)).status;
    expect({ visitor: await status(actors.visitor), buyer: await status(actors.buyer), otherBuyer: await status(actors.otherBuyer), otherShop: await status(actors.otherShop), staff: await status(actors.staff) })
      .toEqual({ visitor: 401, buyer: 403, otherBuyer: 403, otherShop: 403, staff: 200 });
    expect((await actors.visitor.get("/api/v1/quotes")).status).toBe(401);
  });

  it("pages: the quote page for its buyer only, the shop's order page for its members only", async () => {
    const q = await quotedQuote();
    const page = async (c: Client, path: string) => (await c.get(path)).status;
    expect(await page(actors.buyer, `/quotes/${q.id}`)).toBe(200);
    expect(await page(actors.otherBuyer, `/quotes/${q.id}`)).toBe(404);
    expect(await page(actors.otherShop, `/quotes/${q.id}`)).toBe(404);
    expect(await page(actors.visitor, `/quotes/${q.id}`)).toBe(307);
    expect(await page(actors.staff, `/shop/orders/${q.id}`)).toBe(200);
    expect(await page(actors.otherShop, `/shop/orders/${q.id}`)).toBe(404);
    // A buyer in no shop meets the dashboard's "for shops" page (app/shop/layout.tsx), not the order.
    const asBuyer = await actors.buyer.get(`/shop/orders/${q.id}`);
    const html = await asBuyer.text();
    expect(asBuyer.status).toBe(200);
    expect(html).toContain("This part of Trainyard is for shops");
    expect(html).not.toContain(q.ref);
    expect(await page(actors.visitor, "/account/orders")).toBe(307);
  });

  it("asking for a quote: 401 signed out, 400 with field errors for a bad body, an unknown shop or someone's private build", async () => {
    expect((await actors.visitor.post("/api/v1/quotes", { build: build.slug, shop: shop.slug })).status).toBe(401);
    const empty = await actors.buyer.post("/api/v1/quotes", { build: "", shop: shop.slug, total: 1 });
    expect(empty.status).toBe(400);
    expect((await empty.json()).error.fields).toBeTruthy();
    const unknown = await actors.buyer.post("/api/v1/quotes", { build: build.slug, shop: "no-such-shop" });
    expect(unknown.status).toBe(400);
    expect((await unknown.json()).error.fields.shop).toBeTruthy();
    const privateSlug = await saveBuild(actors.buyer, "private");
    expect((await actors.otherBuyer.post("/api/v1/quotes", { build: privateSlug, shop: shop.slug })).status).toBe(404);
  });
});
