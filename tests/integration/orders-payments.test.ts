// Quote → checkout → payment against the local Stripe fake, and the stock rules around it:
// signatures, replays, expiry, declines, and 50 buyers racing for 3 units.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { TEST_CARDS } from "@/lib/dev/stripe-fake";
import { BASE_URL, Client, firstLink, waitForMail } from "../support/http";
import {
  answer, flagshipBuild, makeShop, makeUser, payOnFake, pool, postEvent, quoteRow, requestQuote, shelf, stock, stripe, WEBHOOK_SECRET, type QuoteJson,
} from "./orders-support";

let buyer: Client;
let staff: { id: string; email: string; client: Client };
let shop: { id: string; slug: string };
let build: { slug: string; connectors: string[] };
const ON_HAND = 20;

beforeAll(async () => {
  buyer = await new Client().signIn("member@trainyard.test");
  staff = await makeUser("owner");
  shop = await makeShop("Pay Test Optics", staff.id);
  build = await flagshipBuild(buyer);
  expect(build.connectors.length).toBeGreaterThan(0);
  await stock(shop.id, build.connectors, ON_HAND);
});
afterAll(async () => { await pool.end(); });

async function quoted(quantities: Record<string, number> = {}): Promise<QuoteJson> {
  const q = await requestQuote(buyer, build.slug, shop.slug);
  const res = await answer(staff.client, q, quantities);
  expect(res.status).toBe(200);
  return await res.json() as QuoteJson;
}

async function checkout(q: QuoteJson): Promise<{ url: string; sessionId: string }> {
  const res = await buyer.post(`/api/v1/quotes/${q.id}/checkout`);
  expect(res.status, await res.clone().text()).toBe(201);
  return await res.json();
}

const part = () => build.connectors[0];

describe("a quote from request to payment", () => {
  it("mails the shop, mails the buyer the quote, reserves on checkout and moves reserved to sold on payment", async () => {
    const q = await requestQuote(buyer, build.slug, shop.slug);
    expect(q.status).toBe("requested");
    await waitForMail(staff.email, `Quote request ${q.ref}`);

    const res = await answer(staff.client, q, {}, { shippingCents: 950 });
    expect(res.status).toBe(200);
    const a = await res.json() as QuoteJson;
    const expected = a.lines.reduce((s, l) => s + l.quantity * l.unitPriceCents, 0) + 950;
    expect(a).toMatchObject({ status: "quoted", shippingCents: 950, totalCents: expected });
    const mail = await waitForMail("member@trainyard.test", `Your quote ${q.ref}`);
    expect(firstLink(mail.text)).toMatch(new RegExp(`/quotes/${q.id}$`));

    const before = await shelf(shop.id, part());
    const { url, sessionId } = await checkout(a);
    const qty = a.lines.find((l) => l.partSlug === part())!.quantity;
    expect(await shelf(shop.id, part())).toEqual({ onHand: before.onHand, reserved: before.reserved + qty });
    // Amounts come from the server's quote, never the browser.
    const session = await stripe.checkout.sessions.retrieve(sessionId);
    expect(session.amount_total).toBe(expected);
    expect(session.metadata?.quoteId).toBe(q.id);

    const paid = await payOnFake(url, TEST_CARDS.succeeds);
    expect(paid.status).toBe(303);
    expect(paid.headers.get("location")).toContain(`/quotes/${q.id}?paid=`);
    expect(await shelf(shop.id, part())).toEqual({ onHand: before.onHand - qty, reserved: before.reserved });
    expect((await quoteRow(q.id)).status).toBe("paid");
    await waitForMail("member@trainyard.test", `Paid: order ${q.ref}`);
    await waitForMail(staff.email, `Order ${q.ref} paid`);

    // Ship with tracking, then refund through the fake.
    expect((await staff.client.post(`/api/v1/orders/${q.id}/ship`, { tracking: "" })).status).toBe(400);
    const shipped = await staff.client.post(`/api/v1/orders/${q.id}/ship`, { tracking: "Eastmere Post EP 4471 0923" });
    expect(shipped.status).toBe(200);
    await waitForMail("member@trainyard.test", `Shipped: order ${q.ref}`);
    const refunded = await staff.client.post(`/api/v1/orders/${q.id}/refund`, {});
    expect(refunded.status).toBe(200);
    const { refundId } = await refunded.json() as { refundId: string };
    expect((await stripe.refunds.retrieve(refundId)).amount).toBe(expected);
    expect((await staff.client.post(`/api/v1/orders/${q.id}/refund`, {})).status).toBe(409);
    await waitForMail("member@trainyard.test", `Refunded: order ${q.ref}`);
  });

  it("answers a second click on pay with the same payment page, reserving once", async () => {
    const q = await quoted();
    const before = await shelf(shop.id, part());
    const first = await checkout(q);
    const second = await checkout(q);
    expect(second.url).toBe(first.url);
    const qty = q.lines.find((l) => l.partSlug === part())!.quantity;
    expect((await shelf(shop.id, part())).reserved).toBe(before.reserved + qty);
    expect((await buyer.delete(`/api/v1/quotes/${q.id}/checkout`)).status).toBe(200);
    expect(await shelf(shop.id, part())).toEqual(before);
  });

  it("refuses a shop answer with a line from another quote or a negative price, with field errors", async () => {
    const q = await requestQuote(buyer, build.slug, shop.slug);
    const foreign = await answer(staff.client, { ...q, lines: [{ ...q.lines[0], id: "not-a-line" }] });
    expect(foreign.status).toBe(400);
    expect((await foreign.json()).error.fields["lines.0.id"]).toBeTruthy();
    const negative = await staff.client.post(`/api/v1/quotes/${q.id}/answer`, { lines: [{ id: q.lines[0].id, quantity: 1, unitPriceCents: -5 }], shippingCents: 0, validDays: 7 });
    expect(negative.status).toBe(400);
    expect((await negative.json()).error.fields["lines.0.unitPriceCents"]).toBeTruthy();
    expect((await quoteRow(q.id)).status).toBe("requested");
  });

  it("refuses to pay an expired quote with a clear message", async () => {
    const q = await quoted();
    await pool.query(`update quotes set expires_at = now() - interval '1 minute' where id = $1`, [q.id]);
    const before = await shelf(shop.id, part());
    const res = await buyer.post(`/api/v1/quotes/${q.id}/checkout`);
    expect(res.status).toBe(409);
    expect((await res.json()).error.message).toMatch(/expired/i);
    expect(await shelf(shop.id, part())).toEqual(before);
  });
});

describe("the webhook", () => {
  it("answers 400 to a bad or missing signature and changes nothing; the same event signed properly pays", async () => {
    const q = await quoted();
    const { sessionId } = await checkout(q);
    const reserved = await shelf(shop.id, part());
    const session = { ...(await stripe.checkout.sessions.retrieve(sessionId)), status: "complete", payment_status: "paid", payment_intent: "pi_forged" };
    const payload = JSON.stringify({ id: `evt_forged_${Date.now()}`, object: "event", type: "checkout.session.completed", created: Math.floor(Date.now() / 1000), data: { object: session } });

    const bad = await postEvent(payload, "whsec_not_the_secret");
    expect(bad.status).toBe(400);
    const missing = await postEvent(payload, null);
    expect(missing.status).toBe(400);
    // Signed properly, then altered on the way: the signature no longer matches the body.
    const tampered = await fetch(`${BASE_URL}/api/v1/webhooks/stripe`, {
      method: "POST", body: payload.replace("pi_forged", "pi_altered"),
      headers: { "content-type": "application/json", "stripe-signature": stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET }) },
    });
    expect(tampered.status).toBe(400);
    expect((await quoteRow(q.id)).status).toBe("awaiting_payment");
    expect(await shelf(shop.id, part())).toEqual(reserved);
    const { rows } = await pool.query(`select 1 from payment_events where event_id = $1`, [JSON.parse(payload).id]);
    expect(rows).toHaveLength(0);

    const good = await postEvent(payload);
    expect(good.status).toBe(200);
    expect((await quoteRow(q.id)).status).toBe("paid");
  });

  it("moves stock once for a replayed event, and an out-of-order expiry of a paid session changes nothing", async () => {
    const q = await quoted();
    const before = await shelf(shop.id, part());
    const { url, sessionId } = await checkout(q);
    expect((await payOnFake(url, TEST_CARDS.succeeds)).status).toBe(303);
    const after = await shelf(shop.id, part());
    const qty = q.lines.find((l) => l.partSlug === part())!.quantity;
    expect(after).toEqual({ onHand: before.onHand - qty, reserved: before.reserved });

    const events = await stripe.events.list({ type: "checkout.session.completed", limit: 100 });
    const event = events.data.find((e) => (e.data.object as { id: string }).id === sessionId)!;
    expect(event).toBeTruthy();
    for (let i = 0; i < 3; i++) {
      const res = await postEvent(JSON.stringify(event));
      expect(res.status).toBe(200);
      expect(await res.json()).toMatchObject({ duplicate: true });
    }
    const late = JSON.stringify({ id: `evt_late_${Date.now()}`, object: "event", type: "checkout.session.expired", created: Math.floor(Date.now() / 1000), data: { object: { ...event.data.object, status: "expired" } } });
    expect((await postEvent(late)).status).toBe(200);
    expect(await shelf(shop.id, part())).toEqual(after);
    expect((await quoteRow(q.id)).status).toBe("paid");
  });
});

describe("reservations that end without payment", () => {
  it("releases the reservation when the session expires, and the quote can be paid again", async () => {
    const q = await quoted();
    const before = await shelf(shop.id, part());
    const { sessionId } = await checkout(q);
    expect((await shelf(shop.id, part())).reserved).toBeGreaterThan(before.reserved);
    const expired = await stripe.checkout.sessions.expire(sessionId);
    expect(expired.status).toBe("expired");
    expect(await shelf(shop.id, part())).toEqual(before);
    expect((await quoteRow(q.id)).status).toBe("quoted");
    const again = await checkout(q);
    expect(again.sessionId).not.toBe(sessionId);
    await stripe.checkout.sessions.expire(again.sessionId);
    expect(await shelf(shop.id, part())).toEqual(before);
  });

  it("releases the reservation when the card is declined", async () => {
    const q = await quoted();
    const before = await shelf(shop.id, part());
    const { url } = await checkout(q);
    const declined = await payOnFake(url, TEST_CARDS.declines);
    expect(declined.status).toBe(402);
    expect(await declined.text()).toMatch(/declined/i);
    expect(await shelf(shop.id, part())).toEqual(before);
    expect((await quoteRow(q.id)).status).toBe("quoted");
  });
});

describe("50 buyers, 3 on the shelf", () => {
  it("lets exactly 3 checkouts reserve; 47 get a clear out-of-stock; available never drops below 0", async () => {
    const racer = await makeUser("racer");
    const rushShop = await makeShop("Rush Test Optics", staff.id);
    await stock(rushShop.id, build.connectors, 3);
    const target = part();
    const only = Object.fromEntries(build.connectors.map((s) => [s, s === target ? 1 : 0]));
    const quotes: QuoteJson[] = [];
    for (let i = 0; i < 50; i++) {
      const q = await requestQuote(racer.client, build.slug, rushShop.slug, `racer ${i}`);
      const res = await answer(staff.client, q, only);
      expect(res.status).toBe(200);
      quotes.push(await res.json() as QuoteJson);
    }
    let lowest = Infinity;
    let watching = true;
    const watch = (async () => {
      while (watching) {
        const s = await shelf(rushShop.id, target);
        lowest = Math.min(lowest, s.onHand - s.reserved);
        await new Promise((r) => setTimeout(r, 5));
      }
    })();
    const results = await Promise.all(quotes.map(async (q) => {
      const res = await racer.client.post(`/api/v1/quotes/${q.id}/checkout`);
      return { status: res.status, body: await res.json() as { sessionId?: string; error?: { code: string; message: string } } };
    }));
    watching = false;
    await watch;
    const ok = results.filter((r) => r.status === 201);
    const refused = results.filter((r) => r.status === 409);
    expect(ok).toHaveLength(3);
    expect(refused).toHaveLength(47);
    for (const r of refused) {
      expect(r.body.error!.code).toBe("conflict:out_of_stock");
      expect(r.body.error!.message).toMatch(/^Out of stock: .+ \(1 quoted, 0 in stock\)/);
    }
    expect(lowest).toBeGreaterThanOrEqual(0);
    expect(await shelf(rushShop.id, target)).toEqual({ onHand: 3, reserved: 3 });
    for (const r of ok) await stripe.checkout.sessions.expire(r.body.sessionId!);
    expect(await shelf(rushShop.id, target)).toEqual({ onHand: 3, reserved: 0 });
  }, 240_000); // 50 requests and answers first, each sending mail: slow on a busy 2-core machine
});
