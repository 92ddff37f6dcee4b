// Shared by the orders tests: people and shops made straight in the test database (the demo
// shop's stock stays as the demo left it), and the payment fake through the real SDK.
import { hashPassword } from "better-auth/crypto";
import pg from "pg";
import Stripe from "stripe";
import { FAKE_STRIPE_SECRET_KEY, FAKE_STRIPE_WEBHOOK_SECRET } from "@/lib/dev/stripe-fake";
import { BASE_URL, Client, DEMO_PASSWORD } from "../support/http";
import { saveBuild } from "./builds-support";

const url = process.env.DATABASE_URL;
if (!url) throw new Error("DATABASE_URL is not set: the orders tests read stock from the database (npm test sets it).");
export const pool = new pg.Pool({ connectionString: url, max: 4 });

export const stripe = new Stripe(process.env.STRIPE_SECRET_KEY ?? FAKE_STRIPE_SECRET_KEY, {
  host: process.env.STRIPE_API_HOST ?? "127.0.0.1", port: process.env.STRIPE_API_PORT, protocol: process.env.STRIPE_API_PROTOCOL === "https" ? "https" : "http",
});
export const WEBHOOK_SECRET = process.env.STRIPE_WEBHOOK_SECRET ?? FAKE_STRIPE_WEBHOOK_SECRET;

const tag = () => `${Date.now().toString(36)}${Math.floor(Math.random() * 1e6).toString(36)}`;

export async function makeUser(label: string): Promise<{ id: string; email: string; client: Client }> {
  const id = crypto.randomUUID();
  const email = `${label}-${tag()}@orders.test`;
  await pool.query(`insert into "user" (id, name, email, email_verified, role) values ($1, $2, $3, true, 'member')`, [id, `Test ${label}`, email]);
  await pool.query(`insert into account (id, account_id, provider_id, user_id, password) values ($1, $2, 'credential', $2, $3)`, [crypto.randomUUID(), id, await hashPassword(DEMO_PASSWORD)]);
  return { id, email, client: await new Client().signIn(email) };
}

export async function makeShop(name: string, ownerId: string): Promise<{ id: string; slug: string }> {
  const id = crypto.randomUUID();
  const slug = `${name.toLowerCase().replace(/\W+/g, "-")}-${tag()}`;
  await pool.query(`insert into organization (id, name, slug) values ($1, $2, $3)`, [id, name, slug]);
  await pool.query(`insert into shop_profiles (organization_id, currency) values ($1, 'USD')`, [id]);
  await addMember(id, ownerId, "owner");
  return { id, slug };
}

export async function addMember(organizationId: string, userId: string, role: "owner" | "staff") {
  await pool.query(`insert into member (id, organization_id, user_id, role) values ($1, $2, $3, $4)`, [crypto.randomUUID(), organizationId, userId, role]);
}

/** Put each part on the shop's shelf: `onHand` of each at 12.00 (or `priceCents`). */
export async function stock(organizationId: string, partSlugs: string[], onHand: number, priceCents = 1200) {
  for (const [i, slug] of partSlugs.entries()) {
    await pool.query(
      `insert into shop_inventory (organization_id, part_id, sku, price_cents, currency, on_hand, reserved)
       select $1, id, $2, $3, 'USD', $4, 0 from parts where slug = $5
       on conflict (organization_id, part_id) do update set on_hand = excluded.on_hand, reserved = 0`,
      [organizationId, `T-${i}-${tag()}`, priceCents, onHand, slug],
    );
  }
}

export async function shelf(organizationId: string, partSlug: string): Promise<{ onHand: number; reserved: number }> {
  const { rows } = await pool.query(`select i.on_hand as "onHand", i.reserved from shop_inventory i join parts p on p.id = i.part_id where i.organization_id = $1 and p.slug = $2`, [organizationId, partSlug]);
  return rows[0];
}

/** The member saves the flagship train; returns its slug and the connecting parts it needs (by slug, with counts). */
export async function flagshipBuild(owner: Client) {
  const slug = await saveBuild(owner, "unlisted");
  const build = await (await owner.get(`/api/v1/builds/${slug}`)).json() as { chain: { steps: { role: string; partId: string }[] } };
  const connectors = build.chain.steps.filter((s) => s.role === "connector").map((s) => s.partId.replace(/~owned$/, ""));
  return { slug, connectors: [...new Set(connectors)] };
}

export type QuoteJson = { id: string; ref: string; status: string; totalCents: number; shippingCents: number; currency: string; lines: { id: string; partSlug: string; quantity: number; unitPriceCents: number }[] };

export async function requestQuote(buyer: Client, build: string, shop: string, note = "Please ship to Eastmere."): Promise<QuoteJson> {
  const res = await buyer.post("/api/v1/quotes", { build, shop, note });
  if (res.status !== 201) throw new Error(`quote request failed: ${res.status} ${await res.text()}`);
  const { id } = await res.json() as { id: string };
  return await (await buyer.get(`/api/v1/quotes/${id}`)).json() as QuoteJson;
}

/** The shop answers: `quantities` by part slug (missing → as asked), shipping 8.00, valid 14 days. */
export async function answer(staff: Client, quote: QuoteJson, quantities: Record<string, number> = {}, extra: Record<string, unknown> = {}): Promise<Response> {
  return staff.post(`/api/v1/quotes/${quote.id}/answer`, {
    lines: quote.lines.map((l) => ({ id: l.id, quantity: quantities[l.partSlug] ?? l.quantity, unitPriceCents: l.unitPriceCents })),
    shippingCents: 800, validDays: 14, note: "In stock, ships tomorrow.", ...extra,
  });
}

/** What a person does on the fake's hosted page: submit a card number. */
export async function payOnFake(checkoutUrl: string, card: string): Promise<Response> {
  return fetch(checkoutUrl, { method: "POST", body: new URLSearchParams({ card }), redirect: "manual" });
}

/** Post an event body to the app's webhook, signed with `secret` (or unsigned with null). */
export async function postEvent(payload: string, secret: string | null = WEBHOOK_SECRET): Promise<Response> {
  const headers: Record<string, string> = { "content-type": "application/json" };
  if (secret) headers["stripe-signature"] = stripe.webhooks.generateTestHeaderString({ payload, secret });
  return fetch(`${BASE_URL}/api/v1/webhooks/stripe`, { method: "POST", headers, body: payload });
}

export async function quoteRow(id: string) {
  const { rows } = await pool.query(`select status, checkout_session_id as "sessionId", payment_intent_id as "paymentIntentId", total_cents as "totalCents" from quotes where id = $1`, [id]);
  return rows[0] as { status: string; sessionId: string | null; paymentIntentId: string | null; totalCents: number };
}
