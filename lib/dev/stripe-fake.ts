// A local stand-in for the payment provider, spoken to through the real `stripe` SDK (its
// host/port/protocol settings). It keeps everything in memory and implements only what
// Trainyard uses: Checkout Sessions (create, retrieve, line items, expire), refunds, events,
// a plain hosted payment page with two test cards, and webhooks signed the provider's way.
import { randomBytes } from "node:crypto";
import http from "node:http";
import Stripe from "stripe";
import { TEST_CARDS, fakePaymentPage, fakeResultPage } from "./stripe-fake-page";

export { TEST_CARDS };

export const FAKE_STRIPE_SECRET_KEY = "sk_test_trainyard_local_fake";
export const FAKE_STRIPE_WEBHOOK_SECRET = "whsec_trainyard_local_fake";

type Obj = Record<string, unknown>;
type LineItem = { name: string; unitAmount: number; quantity: number; currency: string };
type Session = Obj & { id: string; status: "open" | "complete" | "expired"; amount_total: number; currency: string; url: string; success_url: string; cancel_url: string | null };

const id = (prefix: string) => `${prefix}_${randomBytes(12).toString("base64url").replace(/[-_]/g, "x")}`;
const now = () => Math.floor(Date.now() / 1000);

/** The SDK sends form bodies in bracket notation (`line_items[0][price_data][currency]=usd`). */
export function parseStripeForm(body: string): Obj {
  const root: Obj = {};
  for (const [rawKey, value] of new URLSearchParams(body)) {
    const keys = rawKey.split(/[[\]]+/).filter(Boolean);
    let node: Obj = root;
    keys.forEach((k, i) => {
      if (i === keys.length - 1) { node[k] = value; return; }
      node[k] ??= {};
      node = node[k] as Obj;
    });
  }
  return root;
}

const listOf = (v: unknown): Obj[] => (v && typeof v === "object" ? Object.entries(v as Obj).sort(([a], [b]) => Number(a) - Number(b)).map(([, x]) => x as Obj) : []);

class FakeError extends Error {
  constructor(readonly status: number, message: string, readonly code?: string, readonly type = "invalid_request_error") { super(message); }
}

export async function startStripeFake(opts: { port: number; webhookUrl: string; secretKey?: string; webhookSecret?: string; log?: (m: string) => void }) {
  const secretKey = opts.secretKey ?? FAKE_STRIPE_SECRET_KEY;
  const webhookSecret = opts.webhookSecret ?? FAKE_STRIPE_WEBHOOK_SECRET;
  const base = `http://127.0.0.1:${opts.port}`;
  const signer = new Stripe(secretKey);
  const sessions = new Map<string, Session>();
  const lineItems = new Map<string, LineItem[]>();
  const intents = new Map<string, Obj & { amount: number; amount_refunded: number; currency: string }>();
  const refunds = new Map<string, Obj>();
  const events: Obj[] = [];
  const idempotent = new Map<string, { status: number; body: unknown }>();
  const timers = new Set<NodeJS.Timeout>();

  async function deliver(event: Obj) {
    const payload = JSON.stringify(event, null, 2);
    for (let attempt = 0; attempt < 6; attempt++) {
      try {
        const header = signer.webhooks.generateTestHeaderString({ payload, secret: webhookSecret });
        const res = await fetch(opts.webhookUrl, { method: "POST", headers: { "content-type": "application/json", "stripe-signature": header }, body: payload });
        await res.text();
        if (res.ok) return;
        opts.log?.(`[stripe-fake] webhook ${event.type} answered ${res.status}; retrying`);
      } catch (err) {
        opts.log?.(`[stripe-fake] webhook ${event.type} failed (${(err as Error).message}); retrying`);
      }
      await new Promise((r) => setTimeout(r, 300 * 2 ** attempt));
    }
  }

  /** Records an event and posts it; resolves once delivered (or given up), like a first attempt. */
  function emit(type: string, object: Obj): Promise<void> {
    const event = { id: id("evt"), object: "event", api_version: "2026-10-28.endive", created: now(), livemode: false, pending_webhooks: 1, type, data: { object: structuredClone(object) } };
    events.unshift(event);
    return deliver(event);
  }

  function sessionOrThrow(sid: string): Session {
    const s = sessions.get(sid);
    if (!s) throw new FakeError(404, `No such checkout.session: '${sid}'`, "resource_missing");
    return s;
  }

  async function expire(s: Session) {
    if (s.status !== "open") throw new FakeError(400, `Only Checkout Sessions with a status of open can be expired; this one is ${s.status}.`, "checkout_session_not_open");
    s.status = "expired";
    await emit("checkout.session.expired", s);
  }

  function createSession(p: Obj): Session {
    const items = listOf(p.line_items).map((li): LineItem => {
      const pd = li.price_data as Obj | undefined;
      const unitAmount = Number(pd?.unit_amount);
      const quantity = Number(li.quantity ?? 1);
      if (!pd || !Number.isInteger(unitAmount) || unitAmount < 0) throw new FakeError(400, "Each line item needs price_data with a whole unit_amount.", "parameter_invalid_integer");
      if (!Number.isInteger(quantity) || quantity < 1) throw new FakeError(400, "Each line item needs a quantity of at least 1.", "parameter_invalid_integer");
      return { name: String((pd.product_data as Obj | undefined)?.name ?? "Item"), unitAmount, quantity, currency: String(pd.currency ?? "").toLowerCase() };
    });
    if (!items.length) throw new FakeError(400, "line_items is required in payment mode.", "parameter_missing");
    const currency = items[0].currency;
    if (!/^[a-z]{3}$/.test(currency) || items.some((i) => i.currency !== currency)) throw new FakeError(400, "All line items must share one three-letter currency.", "parameter_invalid");
    if (typeof p.success_url !== "string") throw new FakeError(400, "success_url is required.", "parameter_missing");
    const expiresAt = p.expires_at ? Number(p.expires_at) : now() + 24 * 3600;
    if (!(expiresAt >= now() + 30 * 60 - 5 && expiresAt <= now() + 24 * 3600 + 5)) throw new FakeError(400, "expires_at must be between 30 minutes and 24 hours from now.", "parameter_invalid");
    const sid = id("cs_test");
    const amount = items.reduce((s, i) => s + i.unitAmount * i.quantity, 0);
    const session: Session = {
      id: sid, object: "checkout.session", mode: String(p.mode ?? "payment"), livemode: false, created: now(), expires_at: expiresAt,
      status: "open", payment_status: "unpaid", amount_subtotal: amount, amount_total: amount, currency,
      client_reference_id: p.client_reference_id ?? null, customer_email: p.customer_email ?? null,
      metadata: (p.metadata as Obj | undefined) ?? {}, payment_intent: null,
      success_url: p.success_url, cancel_url: typeof p.cancel_url === "string" ? p.cancel_url : null, url: `${base}/pay/${sid}`,
    };
    sessions.set(sid, session);
    lineItems.set(sid, items);
    const timer = setTimeout(() => { timers.delete(timer); if (session.status === "open") void expire(session).catch(() => {}); }, Math.max(0, expiresAt * 1000 - Date.now()));
    timer.unref();
    timers.add(timer);
    return session;
  }

  function refund(p: Obj) {
    const pi = intents.get(String(p.payment_intent ?? ""));
    if (!pi) throw new FakeError(404, `No such payment_intent: '${String(p.payment_intent ?? "")}'`, "resource_missing");
    const amount = p.amount === undefined ? pi.amount - pi.amount_refunded : Number(p.amount);
    if (!Number.isInteger(amount) || amount < 1 || amount > pi.amount - pi.amount_refunded) {
      throw new FakeError(400, `Refund amount must be between 1 and the ${pi.amount - pi.amount_refunded} not yet refunded.`, "charge_already_refunded");
    }
    pi.amount_refunded += amount;
    const r = { id: id("re"), object: "refund", amount, currency: pi.currency, payment_intent: pi.id, status: "succeeded", created: now(), metadata: (p.metadata as Obj | undefined) ?? {} };
    refunds.set(r.id as string, r);
    void emit("refund.created", r);
    return r;
  }

  async function api(method: string, path: string, body: Obj, query: URLSearchParams): Promise<unknown> {
    // The id captured from a path of this shape, if the path has it.
    const idIn = (shape: RegExp) => path.match(shape)?.[1];
    let m: string | undefined;
    if (method === "POST" && path === "/v1/checkout/sessions") return createSession(body);
    m = idIn(/^\/v1\/checkout\/sessions\/([\w-]+)$/);
    if (method === "GET" && m) return sessionOrThrow(m);
    m = idIn(/^\/v1\/checkout\/sessions\/([\w-]+)\/line_items$/);
    if (method === "GET" && m) {
      sessionOrThrow(m);
      const data = lineItems.get(m)!.map((li, i) => ({ id: `li_${i}`, object: "item", description: li.name, quantity: li.quantity, amount_total: li.unitAmount * li.quantity, currency: li.currency }));
      return { object: "list", data, has_more: false, url: path };
    }
    m = idIn(/^\/v1\/checkout\/sessions\/([\w-]+)\/expire$/);
    if (method === "POST" && m) { const s = sessionOrThrow(m); await expire(s); return s; }
    if (method === "POST" && path === "/v1/refunds") return refund(body);
    m = idIn(/^\/v1\/refunds\/([\w-]+)$/);
    if (method === "GET" && m) {
      const r = refunds.get(m);
      if (!r) throw new FakeError(404, `No such refund: '${m}'`, "resource_missing");
      return r;
    }
    if (method === "GET" && path === "/v1/events") {
      const type = query.get("type");
      const limit = Math.min(100, Number(query.get("limit") ?? 10));
      const data = events.filter((e) => !type || e.type === type).slice(0, limit);
      return { object: "list", data, has_more: false, url: path };
    }
    const eventId = idIn(/^\/v1\/events\/([\w-]+)$/);
    if (method === "GET" && eventId) {
      const e = events.find((x) => x.id === eventId);
      if (!e) throw new FakeError(404, `No such event: '${eventId}'`, "resource_missing");
      return e;
    }
    throw new FakeError(404, `Unrecognized request URL (${method}: ${path}). The local fake implements only what Trainyard uses.`);
  }

  /** The hosted page's form: the first test card pays, the second is declined and ends the session. */
  async function pay(sid: string, card: string): Promise<{ redirect?: string; html?: string; status?: number }> {
    const s = sessions.get(sid);
    if (!s) return { status: 404, html: fakeResultPage({ title: "No such payment", body: "This payment page does not exist (the local fake forgets everything when it restarts)." }) };
    const items = lineItems.get(sid)!;
    if (s.status !== "open") return { status: 409, html: fakeResultPage({ title: s.status === "complete" ? "Already paid" : "This payment has ended", body: s.status === "complete" ? "This session was paid already." : "This session expired or was ended; start again from the shop's quote.", back: s.status === "complete" ? s.success_url.replace("{CHECKOUT_SESSION_ID}", s.id) : s.cancel_url }) };
    const digits = card.replace(/\D/g, "");
    if (digits === TEST_CARDS.succeeds.replace(/\D/g, "")) {
      const pi = { id: id("pi"), object: "payment_intent", amount: s.amount_total, amount_received: s.amount_total, amount_refunded: 0, currency: s.currency, status: "succeeded", created: now() };
      intents.set(pi.id, pi);
      Object.assign(s, { status: "complete", payment_status: "paid", payment_intent: pi.id });
      await emit("checkout.session.completed", s);
      return { redirect: s.success_url.replace("{CHECKOUT_SESSION_ID}", s.id) };
    }
    if (digits === TEST_CARDS.declines.replace(/\D/g, "")) {
      // Real Checkout lets the buyer try another card until the session expires; the fake
      // ends the session at once so the shop's reserved stock comes back without waiting.
      await expire(s);
      return { status: 402, html: fakeResultPage({ title: "Card declined", body: "The test card was declined (as this card always is). The fake ended this payment session, so the reserved stock is released; start again from the quote to try the other card.", back: s.cancel_url }) };
    }
    return { status: 400, html: fakePaymentPage({ session: s, items, error: "The local fake knows only its two test cards; no other number is accepted." }) };
  }

  const server = http.createServer((req, res) => {
    const url = new URL(req.url ?? "/", base);
    let raw = "";
    req.setEncoding("utf8");
    req.on("data", (c: string) => { raw += c; if (raw.length > 1_000_000) req.destroy(); });
    req.on("end", async () => {
      const send = (status: number, body: unknown) => { res.writeHead(status, { "content-type": "application/json" }); res.end(JSON.stringify(body)); };
      try {
        const pageMatch = url.pathname.match(/^\/pay\/([\w-]+)$/);
        if (pageMatch) {
          if (req.method === "POST") {
            const out = await pay(pageMatch[1], String(new URLSearchParams(raw).get("card") ?? ""));
            if (out.redirect) { res.writeHead(303, { location: out.redirect }); res.end(); return; }
            res.writeHead(out.status ?? 200, { "content-type": "text/html; charset=utf-8" }); res.end(out.html); return;
          }
          const s = sessions.get(pageMatch[1]);
          if (!s) { res.writeHead(404, { "content-type": "text/html; charset=utf-8" }); res.end(fakeResultPage({ title: "No such payment", body: "This payment page does not exist (the local fake forgets everything when it restarts)." })); return; }
          res.writeHead(200, { "content-type": "text/html; charset=utf-8" });
          res.end(s.status === "open" ? fakePaymentPage({ session: s, items: lineItems.get(s.id)! }) : fakeResultPage({ title: s.status === "complete" ? "Already paid" : "This payment has ended", body: "Nothing more to do on this page.", back: s.status === "complete" ? s.success_url.replace("{CHECKOUT_SESSION_ID}", s.id) : s.cancel_url }));
          return;
        }
        if (!url.pathname.startsWith("/v1/")) { send(404, { error: { type: "invalid_request_error", message: "Not found" } }); return; }
        if (req.headers.authorization !== `Bearer ${secretKey}`) throw new FakeError(401, "Invalid API Key provided.", "api_key_invalid", "authentication_error");
        const key = req.method === "POST" ? req.headers["idempotency-key"] : undefined;
        const cacheKey = typeof key === "string" ? `${url.pathname}:${key}` : null;
        if (cacheKey && idempotent.has(cacheKey)) { const hit = idempotent.get(cacheKey)!; send(hit.status, hit.body); return; }
        const body = await api(req.method ?? "GET", url.pathname, parseStripeForm(raw), url.searchParams);
        if (cacheKey) idempotent.set(cacheKey, { status: 200, body });
        send(200, body);
      } catch (err) {
        if (err instanceof FakeError) send(err.status, { error: { type: err.type, code: err.code, message: err.message } });
        else send(500, { error: { type: "api_error", message: (err as Error).message } });
      }
    });
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, "127.0.0.1", () => resolve());
  });
  return {
    url: base, host: "127.0.0.1", port: opts.port, secretKey, webhookSecret,
    stop: async () => {
      for (const t of timers) clearTimeout(t);
      server.closeAllConnections();
      await new Promise<void>((r) => server.close(() => r()));
    },
  };
}
