// THE authorization table: every route handler (and every page that shows private data) × every
// kind of visitor, with the status each must get and, for writes, what must (or must not) change.
// tests/integration/authz-matrix.test.ts runs it and fails when a route.ts under app/ has no row.
//
// Adding a route: one line, e.g.
//   row("GET", "/api/v1/shops/[slug]/inventory", (f) => `/api/v1/shops/${f.shopSlug}/inventory`, { ...SIGNED_IN_403, shopOwner: 200, shopStaff: 200 }),
import { expect } from "vitest";
import type { Client } from "../../support/http";
import { flagshipRequest, saveBuild } from "../builds-support";

export const ACTORS = ["anon", "member", "otherMember", "moderator", "admin", "banned", "shopOwner", "shopStaff", "otherShopStaff"] as const;
export type Actor = (typeof ACTORS)[number];
export type Method = "GET" | "POST" | "PUT" | "PATCH" | "DELETE" | "PAGE";

/** Expected status per actor; `_` for everyone not named. An array allows any of its statuses. */
export type Expect = Partial<Record<Actor | "_", number | number[]>>;

export type Fixtures = {
  clients: Record<Actor, Client>;
  emails: Record<Actor, string>;
  /** The member's builds (the member owns every fixture below). */
  publicSlug: string; unlistedSlug: string; privateSlug: string; hiddenSlug: string; privateTitle: string;
  /** The member's pending submission with its spec sheet. */
  submissionId: string; submissionSlug: string; submissionModel: string;
  catalogSlug: string;
  /** The demo shop (owned by shopOwner, shopStaff works there) and another shop. */
  shopId: string; otherShopId: string; shopSlug: string;
  /** A part the demo shop stocks (slug). */
  stockedSlug: string;
  /** A quote the member asked the demo shop for (still "requested"). */
  quoteId: string; quoteRef: string;
  /** A quote awaiting payment (the webhook row must not settle it), and its Checkout Session. */
  awaitingQuoteId: string; awaitingSessionId: string;
  userIds: Record<Exclude<Actor, "anon">, string>;
  sql: <T = Record<string, unknown>>(text: string, values?: unknown[]) => Promise<T[]>;
  /** A quote of the member's at the demo shop, brought to this state (stock sold is put back). */
  newQuote: (state: "requested" | "quoted" | "awaiting" | "paid") => Promise<string>;
  /** The quote's lines as the shop sees them. */
  quoteLines: (id: string) => Promise<{ id: string; quantity: number; unitPriceCents: number }[]>;
  quoteStatus: (id: string) => Promise<string>;
  /** A fresh staff member of the demo shop (returns the member row's id). */
  newShopStaffMember: () => Promise<string>;
  /** A fresh pending invitation to a throwaway shop, for this e-mail address. */
  newInvitation: (email: string) => Promise<{ id: string; shopId: string }>;
  /** Helpers that make a fresh target for one cell (writes must not share state across cells). */
  newBuild: (visibility: "private" | "unlisted" | "public") => Promise<string>;
  newSubmission: () => Promise<{ id: string; slug: string; model: string }>;
};

export type Cell = { f: Fixtures; actor: Actor; as: Client };
/** Runs after the request: `allowed` is whether the expected status was a success. */
export type Effect = (c: Cell & { target: string; res: Response; allowed: boolean }) => Promise<void>;
type Body = unknown | ((c: Cell & { target: string }) => unknown | Promise<unknown>);

export type Row = {
  method: Method; route: string; label?: string;
  /** The concrete path; may create a fresh target for this cell. */
  path: (f: Fixtures, c: Cell) => string | Promise<string>;
  expect: Expect;
  body?: Body;
  effect?: Effect;
};

export function row(method: Method, route: string, path: Row["path"], expect: Expect, more: Partial<Pick<Row, "label" | "body" | "effect">> = {}): Row {
  return { method, route, path, expect, ...more };
}

export function expected(e: Expect, actor: Actor): number[] {
  const v = e[actor] ?? e._;
  if (v === undefined) throw new Error(`no expectation for ${actor}`);
  return Array.isArray(v) ? v : [v];
}

// Common shapes.
const ANYONE: Expect = { _: 200 };
const SIGNED_IN: Expect = { _: 200, anon: 401, banned: 401 };
const MODERATORS = (ok: number): Expect => ({ _: 403, anon: 401, banned: 401, moderator: ok, admin: ok });
/** The member's private build: others cannot even see it (404); moderators see it but may not change it. */
const OWNER_OF_PRIVATE = (ok: number): Expect => ({ _: 404, anon: 401, banned: 401, member: ok, moderator: 403, admin: 403 });
/** Pages that redirect signed-out (and banned) visitors to sign in. */
const PAGE_SIGNED_IN: Expect = { _: 200, anon: 307, banned: 307 };
/** Routes of one shop (the demo shop): its owner and staff. Another shop's staff is refused like anyone. */
const SHOP_MEMBERS = (ok: number): Expect => ({ _: 403, anon: 401, banned: 401, shopOwner: ok, shopStaff: ok });
const SHOP_OWNER = (ok: number): Expect => ({ _: 403, anon: 401, banned: 401, shopOwner: ok });
/** The member's quote at the demo shop: strangers cannot tell it exists (404). */
const QUOTE_VIEWERS = (ok: number): Expect => ({ _: 404, anon: 401, banned: 401, member: ok, shopOwner: ok, shopStaff: ok });
const QUOTE_SHOP_SIDE = (ok: number): Expect => ({ ...QUOTE_VIEWERS(ok), member: 403 });
const QUOTE_BUYER_SIDE = (ok: number): Expect => ({ ...QUOTE_VIEWERS(ok), shopOwner: 403, shopStaff: 403 });
const inDemoShop = (a: Actor) => a === "shopOwner" || a === "shopStaff";
/** Dashboard pages: the demo shop's people see it; another shop's staff see their own shop; the rest are told it is for shops. */
const dashboardEffect: Effect = async ({ res, actor, allowed }) => {
  if (!allowed) return;
  const html = await res.text();
  expect(html.includes("Lantern Row Optics"), "the demo shop's name").toBe(inDemoShop(actor));
  expect(html.includes("This part of Trainyard is for shops"), "the for-shops notice").toBe(!inDemoShop(actor) && actor !== "otherShopStaff");
};

async function getJson(as: Client, path: string) {
  const res = await as.get(path);
  return { status: res.status, body: res.status < 300 ? await res.json() : null };
}

/** Effect helpers read back as an account that can always see the target. */
const readBuild = (f: Fixtures, slug: string) => getJson(f.clients.admin, `/api/v1/builds/${slug}`);

const PDF = new TextEncoder().encode("%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n");
export function submissionForm(model: string): FormData {
  const form = new FormData();
  form.set("part", JSON.stringify({ kind: "spacer", maker: "Matrix Bench Works", model, front: { interface: "M48x0.75", gender: "female" }, rear: { interface: "M48x0.75", gender: "male" }, lengthMm: 7.5, clearApertureMm: 44, weightG: 20 }));
  form.set("specSheet", new Blob([PDF as BlobPart], { type: "application/pdf" }), "sheet.pdf");
  return form;
}
export { flagshipRequest, saveBuild };

/** Secrets of the keys made for the revoke row, by key id (the effect tries the key after the request). */
const KEY_SECRETS = new Map<string, string>();

const stamp = () => `${Date.now()}-${Math.floor(Math.random() * 1e6)}`;

export const MATRIX: Row[] = [
  // ── auth (better-auth) ──────────────────────────────────────────────────────────────────────
  row("GET", "/api/auth/[...all]", () => "/api/auth/get-session", ANYONE, { label: "get-session", effect: async ({ res, actor, f }) => {
    const s = (await res.json()) as { user?: { email: string } } | null;
    // A banned user's session ends at the first look (lib/auth/index.ts), even when the ban was written straight to the database.
    if (actor === "anon" || actor === "banned") expect(s).toBeNull();
    else expect(s?.user?.email).toBe(f.emails[actor]);
  } }),
  row("GET", "/api/auth/[...all]", () => "/api/auth/admin/list-users", { _: 403, anon: 401, banned: 401, admin: 200 }, { label: "admin list-users" }),
  // Non-members get 400 from better-auth today (issue 16 item 9 asks for 403; sec): either is a refusal, and the effect check proves nothing changed.
  row("POST", "/api/auth/[...all]", () => "/api/auth/organization/update", { _: [400, 403], anon: 401, banned: 401, shopOwner: 200, shopStaff: 403 }, {
    label: "update the demo shop",
    body: (c: Cell) => ({ organizationId: c.f.shopId, data: { metadata: { matrix: c.actor } } }),
    effect: async ({ f, actor, allowed }) => {
      const { body } = await getJson(f.clients.shopOwner, `/api/auth/organization/get-full-organization?organizationId=${f.shopId}`);
      const meta = typeof body?.metadata === "string" ? JSON.parse(body.metadata) : body?.metadata;
      expect(meta?.matrix === actor).toBe(allowed);
    },
  }),
  // ── health, catalog, solve ─────────────────────────────────────────────────────────────────
  row("GET", "/api/health", () => "/api/health", ANYONE),
  row("GET", "/api/v1/interfaces", () => "/api/v1/interfaces", ANYONE),
  row("GET", "/api/v1/parts", () => "/api/v1/parts?limit=5", ANYONE),
  row("GET", "/api/v1/parts/[slug]", (f) => `/api/v1/parts/${f.catalogSlug}`, ANYONE, { label: "approved part" }),
  row("GET", "/api/v1/parts/[slug]", (f) => `/api/v1/parts/${f.submissionSlug}`, { _: 404, member: 200, moderator: 200, admin: 200 }, { label: "the member's pending submission" }),
  // Which correctors join a telescope: catalog facts, public.
  row("GET", "/api/v1/parts/[slug]/correctors", () => "/api/v1/parts/corvane-optical-meridian-80-ed/correctors", ANYONE, { effect: async ({ res }) => {
    expect(((await res.json()) as { correctors: unknown[] }).correctors.length).toBeGreaterThan(0);
  } }),
  row("PATCH", "/api/v1/parts/[slug]", (f) => `/api/v1/parts/${f.catalogSlug}`, MODERATORS(200), {
    body: (c: Cell) => ({ description: `Checked by the matrix as ${c.actor}` }),
    effect: async ({ f, actor, allowed }) => {
      const { body } = await getJson(f.clients.anon, `/api/v1/parts/${f.catalogSlug}`);
      if (allowed) expect(body.description).toBe(`Checked by the matrix as ${actor}`);
      else expect(body.description).not.toBe(`Checked by the matrix as ${actor}`);
    },
  }),
  row("POST", "/api/v1/solve", () => "/api/v1/solve", ANYONE, { body: flagshipRequest, effect: async ({ res }) => {
    expect(((await res.json()) as { solutions: unknown[] }).solutions.length).toBeGreaterThan(0);
  } }),
  // ── builds ─────────────────────────────────────────────────────────────────────────────────
  row("GET", "/api/v1/builds", () => "/api/v1/builds", ANYONE, { label: "public list", effect: async ({ res, f }) => {
    const slugs = ((await res.json()) as { items: { slug: string }[] }).items.map((i) => i.slug);
    expect(slugs).not.toContain(f.privateSlug);
    expect(slugs).not.toContain(f.unlistedSlug);
  } }),
  row("GET", "/api/v1/builds", () => "/api/v1/builds?mine=1&limit=100", SIGNED_IN, { label: "mine=1", effect: async ({ res, f, actor, allowed }) => {
    if (!allowed) return;
    const slugs = ((await res.json()) as { items: { slug: string }[] }).items.map((i) => i.slug);
    if (actor === "member") expect(slugs).toContain(f.privateSlug);
    else expect(slugs).not.toContain(f.privateSlug);
  } }),
  row("POST", "/api/v1/builds", () => "/api/v1/builds", { ...SIGNED_IN, _: 201 }, {
    body: (c: Cell) => ({ title: `Matrix save by ${c.actor} ${stamp()}`, visibility: "private", request: flagshipRequest, solutionIndex: 0 }),
    effect: async ({ res, as, allowed }) => {
      if (!allowed) return;
      const { slug } = (await res.json()) as { slug: string };
      expect((await as.get(`/api/v1/builds/${slug}`)).status).toBe(200);
    },
  }),
  row("GET", "/api/v1/builds/[slug]", (f) => `/api/v1/builds/${f.publicSlug}`, ANYONE, { label: "public build" }),
  row("GET", "/api/v1/builds/[slug]", (f) => `/api/v1/builds/${f.unlistedSlug}`, ANYONE, { label: "unlisted build" }),
  row("GET", "/api/v1/builds/[slug]", (f) => `/api/v1/builds/${f.privateSlug}`, { _: 404, member: 200, moderator: 200, admin: 200 }, { label: "private build" }),
  row("GET", "/api/v1/builds/[slug]", (f) => `/api/v1/builds/${f.hiddenSlug}`, { _: 404, member: 200, moderator: 200, admin: 200 }, { label: "hidden build" }),
  row("PATCH", "/api/v1/builds/[slug]", (f) => f.newBuild("private"), OWNER_OF_PRIVATE(200), {
    label: "private build", body: (c: Cell) => ({ title: `Renamed by ${c.actor}` }),
    effect: async ({ f, target, actor, allowed }) => {
      const { body } = await readBuild(f, target);
      expect(body.title === `Renamed by ${actor}`).toBe(allowed);
    },
  }),
  row("PATCH", "/api/v1/builds/[slug]", (f) => f.newBuild("public"), { _: 403, anon: 401, banned: 401, member: 200 }, {
    label: "public build", body: { visibility: "private" },
    effect: async ({ f, target, allowed }) => expect((await readBuild(f, target)).body.visibility).toBe(allowed ? "private" : "public"),
  }),
  row("DELETE", "/api/v1/builds/[slug]", (f) => f.newBuild("private"), { ...OWNER_OF_PRIVATE(204), admin: 204 }, {
    label: "private build", effect: async ({ f, target, allowed }) => expect((await readBuild(f, target)).status).toBe(allowed ? 404 : 200),
  }),
  row("DELETE", "/api/v1/builds/[slug]", (f) => f.newBuild("public"), { _: 403, anon: 401, banned: 401, member: 204, admin: 204 }, {
    label: "public build", effect: async ({ f, target, allowed }) => expect((await readBuild(f, target)).status).toBe(allowed ? 404 : 200),
  }),
  row("POST", "/api/v1/builds/[slug]/endorse", (f) => f.newBuild("public"), MODERATORS(200), {
    effect: async ({ f, target, allowed }) => expect((await readBuild(f, target)).body.endorsed).toBe(allowed),
  }),
  row("DELETE", "/api/v1/builds/[slug]/endorse", async (f) => {
    const slug = await f.newBuild("public");
    expect((await f.clients.moderator.post(`/api/v1/builds/${slug}/endorse`)).status).toBe(200);
    return slug;
  }, MODERATORS(200), { effect: async ({ f, target, allowed }) => expect((await readBuild(f, target)).body.endorsed).toBe(!allowed) }),
  row("POST", "/api/v1/builds/[slug]/hide", (f) => f.newBuild("public"), MODERATORS(200), {
    body: { reason: "Matrix check of hiding" },
    effect: async ({ f, target, allowed }) => expect((await readBuild(f, target)).body.hidden).toBe(allowed),
  }),
  row("DELETE", "/api/v1/builds/[slug]/hide", async (f) => {
    const slug = await f.newBuild("public");
    expect((await f.clients.moderator.post(`/api/v1/builds/${slug}/hide`, { reason: "Matrix check of hiding" })).status).toBe(200);
    return slug;
  }, MODERATORS(200), {
    effect: async ({ f, target, allowed }) => expect((await readBuild(f, target)).body.hidden).toBe(!allowed),
  }),
  row("POST", "/api/v1/builds/[slug]/threads", (f) => f.newBuild("public"), { ...MODERATORS(201) }, {
    body: { url: "https://forum.example/t/matrix-thread" },
    effect: async ({ f, target, allowed }) => expect((await readBuild(f, target)).body.threads.length).toBe(allowed ? 1 : 0),
  }),
  row("DELETE", "/api/v1/builds/[slug]/threads", async (f) => {
    const slug = await f.newBuild("public");
    expect((await f.clients.moderator.post(`/api/v1/builds/${slug}/threads`, { url: "https://forum.example/t/matrix-thread" })).status).toBe(201);
    return slug;
  }, MODERATORS(200), {
    body: { url: "https://forum.example/t/matrix-thread" },
    effect: async ({ f, target, allowed }) => expect((await readBuild(f, target)).body.threads.length).toBe(allowed ? 0 : 1),
  }),
  // ── gear ───────────────────────────────────────────────────────────────────────────────────
  row("GET", "/api/v1/gear", () => "/api/v1/gear", SIGNED_IN, { effect: async ({ res, actor, allowed }) => {
    if (!allowed) return;
    const items = ((await res.json()) as { items: unknown[] }).items;
    // The demo seed gives only the member a bench of owned parts: nobody else sees it.
    if (actor === "member") expect(items.length).toBeGreaterThan(0);
    else expect(items).toEqual([]);
  } }),
  row("PUT", "/api/v1/gear", () => "/api/v1/gear", SIGNED_IN, {
    body: (c: Cell) => ({ partId: c.f.catalogSlug, quantity: 3 }),
    effect: async ({ as, f, allowed }) => {
      if (!allowed) return;
      const items = ((await (await as.get("/api/v1/gear")).json()) as { items: { part: { slug: string }; quantity: number }[] }).items;
      expect(items.find((i) => i.part.slug === f.catalogSlug)?.quantity).toBe(3);
      expect((await as.request("/api/v1/gear", { method: "PUT", json: { partId: f.catalogSlug, quantity: 0 } })).status).toBe(200);
    },
  }),
  // ── submissions ────────────────────────────────────────────────────────────────────────────
  row("GET", "/api/v1/submissions", () => "/api/v1/submissions", SIGNED_IN, { effect: async ({ res, f, actor, allowed }) => {
    if (!allowed) return;
    const ids = ((await res.json()) as { items: { id: string }[] }).items.map((i) => i.id);
    expect(ids.includes(f.submissionId)).toBe(actor === "member" || actor === "moderator" || actor === "admin");
  } }),
  row("POST", "/api/v1/submissions", () => "/api/v1/submissions", { ...SIGNED_IN, _: 201 }, {
    body: (c: Cell) => submissionForm(`Matrix ${c.actor} ${stamp()}`),
    effect: async ({ res, as, allowed }) => {
      if (!allowed) return;
      const { id } = (await res.json()) as { id: string };
      const mine = ((await (await as.get("/api/v1/submissions")).json()) as { items: { id: string }[] }).items.map((i) => i.id);
      expect(mine).toContain(id);
    },
  }),
  row("GET", "/api/v1/submissions/[id]/spec-sheet", (f) => `/api/v1/submissions/${f.submissionId}/spec-sheet`, { _: 404, anon: 401, banned: 401, member: 200, moderator: 200, admin: 200 }, {
    label: "another member's spec sheet",
    effect: async ({ res, allowed }) => { if (allowed) expect(new TextDecoder().decode(await res.arrayBuffer())).toMatch(/^%PDF-/); },
  }),
  row("POST", "/api/v1/submissions/[id]/review", async (f) => `/api/v1/submissions/${(await f.newSubmission()).id}/review`, MODERATORS(200), {
    body: { decision: "reject", reason: "Matrix check: no maker data" },
    effect: async ({ f, target, allowed }) => {
      const id = target.split("/")[4];
      const pending = ((await (await f.clients.moderator.get("/api/v1/submissions")).json()) as { items: { id: string }[] }).items.map((i) => i.id);
      expect(pending.includes(id)).toBe(!allowed);
    },
  }),
  // ── shops (issue 10) ─────────────────────────────────────────────────────────────────────────
  row("GET", "/api/v1/shops", () => "/api/v1/shops", ANYONE, { effect: async ({ res, f }) => {
    expect(((await res.json()) as { shops: { slug: string }[] }).shops.map((s) => s.slug)).toContain(f.shopSlug);
  } }),
  row("POST", "/api/v1/shops/where-to-buy", () => "/api/v1/shops/where-to-buy", ANYONE, {
    body: (c: Cell) => ({ parts: [{ slug: c.f.stockedSlug, quantity: 1 }] }),
    effect: async ({ res, f }) => {
      expect(JSON.stringify(await res.json())).toContain(f.shopSlug);
    },
  }),
  row("GET", "/api/v1/shops/[slug]/inventory", (f) => `/api/v1/shops/${f.shopSlug}/inventory`, SHOP_MEMBERS(200), { effect: async ({ res, f, allowed }) => {
    if (allowed) expect(((await res.json()) as { items: { slug: string }[] }).items.map((i) => i.slug)).toContain(f.stockedSlug);
  } }),
  row("PUT", "/api/v1/shops/[slug]/inventory", (f) => `/api/v1/shops/${f.shopSlug}/inventory`, SHOP_MEMBERS(200), {
    body: (c: Cell) => ({ items: [{ part: c.f.catalogSlug, sku: `MX-${c.actor}`, priceCents: 1234, currency: "USD", onHand: 2 }] }),
    effect: async ({ f, actor, allowed }) => {
      const inv = f.clients.shopOwner;
      const items = ((await (await inv.get(`/api/v1/shops/${f.shopSlug}/inventory`)).json()) as { items: { slug: string; sku: string }[] }).items;
      expect(items.some((i) => i.sku === `MX-${actor}`)).toBe(allowed);
      if (allowed) expect((await inv.request(`/api/v1/shops/${f.shopSlug}/inventory`, { method: "PUT", json: { remove: [f.catalogSlug] } })).status).toBe(200);
    },
  }),
  row("GET", "/api/v1/shops/[slug]/inventory/export", (f) => `/api/v1/shops/${f.shopSlug}/inventory/export`, SHOP_MEMBERS(200), { effect: async ({ res, f, allowed }) => {
    if (allowed) expect(await res.text()).toContain(f.stockedSlug);
  } }),
  row("POST", "/api/v1/shops/[slug]/inventory/import", (f) => `/api/v1/shops/${f.shopSlug}/inventory/import?confirm=1`, SHOP_MEMBERS(200), {
    label: "confirmed import",
    body: (c: Cell) => new Blob([`catalog_slug,maker,model,sku,price_cents,currency,on_hand\r\n${c.f.catalogSlug},,,MXI-${c.actor},999,USD,1\r\n`], { type: "text/csv" }),
    effect: async ({ f, actor, allowed }) => {
      const inv = f.clients.shopOwner;
      const items = ((await (await inv.get(`/api/v1/shops/${f.shopSlug}/inventory`)).json()) as { items: { sku: string }[] }).items;
      expect(items.some((i) => i.sku === `MXI-${actor}`)).toBe(allowed);
      if (allowed) expect((await inv.request(`/api/v1/shops/${f.shopSlug}/inventory`, { method: "PUT", json: { remove: [f.catalogSlug] } })).status).toBe(200);
    },
  }),
  row("GET", "/api/v1/shops/[slug]/members", (f) => `/api/v1/shops/${f.shopSlug}/members`, SHOP_MEMBERS(200), { effect: async ({ res, f, allowed }) => {
    if (allowed) expect(JSON.stringify(await res.json())).toContain(f.emails.shopOwner);
  } }),
  row("POST", "/api/v1/shops/[slug]/members", (f) => `/api/v1/shops/${f.shopSlug}/members`, SHOP_OWNER(201), {
    label: "invite staff",
    body: (c: Cell) => ({ email: `matrix-invite-${c.actor.toLowerCase()}-${c.f.shopId.slice(0, 6)}-${c.f.quoteId.slice(0, 6)}@example.org` }),
    effect: async ({ f, actor, allowed }) => {
      const rows = await f.sql("select id from invitation where organization_id = $1 and email = $2", [f.shopId, `matrix-invite-${actor.toLowerCase()}-${f.shopId.slice(0, 6)}-${f.quoteId.slice(0, 6)}@example.org`]);
      expect(rows.length).toBe(allowed ? 1 : 0);
    },
  }),
  row("DELETE", "/api/v1/shops/[slug]/members/[memberId]", async (f) => `/api/v1/shops/${f.shopSlug}/members/${await f.newShopStaffMember()}`, SHOP_OWNER(200), {
    label: "remove a staff member",
    effect: async ({ f, target, allowed }) => {
      expect((await f.sql("select id from member where id = $1", [target.split("/").pop()])).length).toBe(allowed ? 0 : 1);
      // Leave the demo shop with its own people only (each of them gets the shop's mail).
      await f.sql("delete from member where id = $1", [target.split("/").pop()]);
    },
  }),
  row("GET", "/api/v1/shops/[slug]/api-keys", (f) => `/api/v1/shops/${f.shopSlug}/api-keys`, SHOP_OWNER(200)),
  row("POST", "/api/v1/shops/[slug]/api-keys", (f) => `/api/v1/shops/${f.shopSlug}/api-keys`, SHOP_OWNER(201), {
    body: (c: Cell) => ({ name: `Matrix key ${c.actor} ${c.f.quoteId.slice(0, 6)}` }),
    effect: async ({ f, actor, allowed }) => {
      const keys = ((await (await f.clients.shopOwner.get(`/api/v1/shops/${f.shopSlug}/api-keys`)).json()) as { keys: { name: string }[] }).keys;
      expect(keys.some((k) => k.name === `Matrix key ${actor} ${f.quoteId.slice(0, 6)}`)).toBe(allowed);
    },
  }),
  row("DELETE", "/api/v1/shops/[slug]/api-keys/[id]", async (f) => {
    const res = await f.clients.shopOwner.post(`/api/v1/shops/${f.shopSlug}/api-keys`, { name: `Matrix key to revoke ${stamp()}` });
    expect(res.status).toBe(201);
    const { key } = (await res.json()) as { key: { id: string; secret: string } };
    KEY_SECRETS.set(key.id, key.secret);
    return `/api/v1/shops/${f.shopSlug}/api-keys/${key.id}`;
  }, SHOP_OWNER(200), {
    label: "revoke a key",
    effect: async ({ f, target, allowed }) => {
      const secret = KEY_SECRETS.get(target.split("/").pop()!)!;
      const res = await f.clients.anon.request(`/api/v1/shops/${f.shopSlug}/inventory`, { headers: { authorization: `Bearer ${secret}` } });
      expect(res.status).toBe(allowed ? 401 : 200);
    },
  }),
  row("GET", "/api/v1/shops/[slug]/stock-next", (f) => `/api/v1/shops/${f.shopSlug}/stock-next`, SHOP_MEMBERS(200)),
  // The invitation is for the other member's address: only that account may accept it.
  row("POST", "/api/v1/shops/invitations/[id]/accept", async (f) => `/api/v1/shops/invitations/${(await f.newInvitation(f.emails.otherMember)).id}/accept`,
    { _: 403, anon: 401, banned: 401, otherMember: 200 }, {
      effect: async ({ f, target, allowed }) => {
        const id = target.split("/")[5];
        const [inv] = await f.sql<{ status: string; organization_id: string }>("select status, organization_id from invitation where id = $1", [id]);
        const joined = await f.sql("select id from member where organization_id = $1 and user_id = $2", [inv.organization_id, f.userIds.otherMember]);
        expect(joined.length).toBe(allowed ? 1 : 0);
        expect(inv.status).toBe(allowed ? "accepted" : "pending");
        // Leave the other member in no shop, as every later row expects.
        await f.sql("delete from member where organization_id = $1 and user_id = $2", [inv.organization_id, f.userIds.otherMember]);
      },
    }),
  row("GET", "/shop/switch", (f) => `/shop/switch?to=${f.shopSlug}`, { _: 303 }, {
    label: "choose the demo shop",
    effect: async ({ res, actor }) => {
      const chosen = res.headers.getSetCookie().some((c) => c.startsWith("ty_shop=lantern-row-optics"));
      expect(chosen).toBe(inDemoShop(actor));
      if (actor === "anon" || actor === "banned") expect(res.headers.get("location")).toContain("/sign-in");
    },
  }),
  // ── quotes and orders (issue 11) ────────────────────────────────────────────────────────────
  row("GET", "/api/v1/orders", () => "/api/v1/orders", SIGNED_IN, { label: "the buyer's own", effect: async ({ res, f, actor, allowed }) => {
    if (!allowed) return;
    const ids = ((await res.json()) as { items: { id: string }[] }).items.map((i) => i.id);
    expect(ids.includes(f.quoteId)).toBe(actor === "member");
  } }),
  row("GET", "/api/v1/orders", (f) => `/api/v1/orders?shop=${f.shopSlug}`, SHOP_MEMBERS(200), { label: "the demo shop's", effect: async ({ res, f, allowed }) => {
    if (allowed) expect(((await res.json()) as { items: { id: string }[] }).items.map((i) => i.id)).toContain(f.quoteId);
  } }),
  row("POST", "/api/v1/quotes", () => "/api/v1/quotes", { _: 201, anon: 401, banned: 401 }, {
    label: "ask the demo shop about a public build",
    body: (c: Cell) => ({ build: c.f.publicSlug, shop: c.f.shopSlug, note: `Matrix request by ${c.actor}` }),
    effect: async ({ res, as, allowed }) => {
      if (!allowed) return;
      const { id } = (await res.json()) as { id: string };
      const mine = ((await (await as.get("/api/v1/quotes")).json()) as { items: { id: string }[] }).items.map((i) => i.id);
      expect(mine).toContain(id);
    },
  }),
  row("GET", "/api/v1/quotes", () => "/api/v1/quotes", SIGNED_IN, { effect: async ({ res, f, actor, allowed }) => {
    if (!allowed) return;
    const ids = ((await res.json()) as { items: { id: string }[] }).items.map((i) => i.id);
    expect(ids.includes(f.quoteId)).toBe(actor === "member");
  } }),
  row("GET", "/api/v1/quotes/[id]", (f) => `/api/v1/quotes/${f.quoteId}`, QUOTE_VIEWERS(200), { effect: async ({ res, f, actor, allowed }) => {
    if (!allowed) return;
    const q = (await res.json()) as { ref: string; buyer: { email?: string } };
    expect(q.ref).toBe(f.quoteRef);
    // Only the shop's side sees the buyer's address.
    expect(q.buyer.email === f.emails.member).toBe(inDemoShop(actor));
  } }),
  row("POST", "/api/v1/quotes/[id]/answer", async (f) => `/api/v1/quotes/${await f.newQuote("requested")}/answer`, QUOTE_SHOP_SIDE(200), {
    body: async (c: Cell & { target: string }) => ({
      lines: (await c.f.quoteLines(c.target.split("/")[4])).map((l, i) => ({ id: l.id, quantity: i === 0 ? 1 : 0, unitPriceCents: l.unitPriceCents })),
      shippingCents: 500, validDays: 7, note: `Answered in the matrix by ${c.actor}`,
    }),
    effect: async ({ f, target, allowed }) => expect(await f.quoteStatus(target.split("/")[4])).toBe(allowed ? "quoted" : "requested"),
  }),
  row("POST", "/api/v1/quotes/[id]/checkout", async (f) => `/api/v1/quotes/${await f.newQuote("quoted")}/checkout`, QUOTE_BUYER_SIDE(201), {
    effect: async ({ f, target, allowed }) => {
      const id = target.split("/")[4];
      expect(await f.quoteStatus(id)).toBe(allowed ? "awaiting_payment" : "quoted");
      // Give the reserved unit back.
      if (allowed) expect((await f.clients.member.delete(`/api/v1/quotes/${id}/checkout`)).status).toBe(200);
    },
  }),
  row("DELETE", "/api/v1/quotes/[id]/checkout", async (f) => `/api/v1/quotes/${await f.newQuote("awaiting")}/checkout`, QUOTE_BUYER_SIDE(200), {
    effect: async ({ f, target, allowed }) => {
      const id = target.split("/")[4];
      expect((await f.quoteStatus(id)) === "awaiting_payment").toBe(!allowed);
      if (!allowed) expect((await f.clients.member.delete(`/api/v1/quotes/${id}/checkout`)).status).toBe(200);
    },
  }),
  row("POST", "/api/v1/quotes/[id]/cancel", async (f) => `/api/v1/quotes/${await f.newQuote("requested")}/cancel`, QUOTE_VIEWERS(200), {
    label: "the buyer withdraws or the shop declines", body: {},
    effect: async ({ f, target, allowed }) => expect(await f.quoteStatus(target.split("/")[4])).toBe(allowed ? "cancelled" : "requested"),
  }),
  row("POST", "/api/v1/orders/[id]/ship", async (f) => `/api/v1/orders/${await f.newQuote("paid")}/ship`, QUOTE_SHOP_SIDE(200), {
    body: { tracking: "Matrix parcel 0001" },
    effect: async ({ f, target, allowed }) => expect(await f.quoteStatus(target.split("/")[4])).toBe(allowed ? "shipped" : "paid"),
  }),
  row("POST", "/api/v1/orders/[id]/refund", async (f) => `/api/v1/orders/${await f.newQuote("paid")}/refund`, QUOTE_SHOP_SIDE(200), {
    body: {},
    effect: async ({ f, target, allowed }) => expect(await f.quoteStatus(target.split("/")[4])).toBe(allowed ? "refunded" : "paid"),
  }),
  // Signed by the payment provider, not by a session: an unsigned event is refused for everyone and settles nothing.
  row("POST", "/api/v1/webhooks/stripe", () => "/api/v1/webhooks/stripe", { _: 400 }, {
    label: "unsigned event",
    body: (c: Cell) => ({ id: `evt_matrix_${c.actor}_${stamp()}`, object: "event", type: "checkout.session.completed",
      data: { object: { id: c.f.awaitingSessionId, object: "checkout.session", status: "complete", payment_status: "paid", client_reference_id: c.f.awaitingQuoteId, metadata: { quoteId: c.f.awaitingQuoteId } } } }),
    effect: async ({ f, res }) => {
      expect(((await res.json()) as { error: { code: string } }).error.code).toMatch(/signature/);
      expect(await f.quoteStatus(f.awaitingQuoteId)).toBe("awaiting_payment");
    },
  }),
  // ── admin and the dev outbox ───────────────────────────────────────────────────────────────
  row("GET", "/api/v1/admin/users", () => "/api/v1/admin/users", { _: 403, anon: 401, banned: 401, admin: 200 }),
  // The outbox holds reset links: only an admin sees it; for everyone else it does not exist.
  row("GET", "/api/dev/outbox", () => "/api/dev/outbox", { _: 404, admin: 200 }),
  // ── unknown API addresses: a JSON 404 for everyone ───────────────────────────────────────────
  ...(["GET", "POST", "PUT", "PATCH", "DELETE"] as const).map((m) => row(m, "/api/[...path]", () => "/api/v1/no-such-route", { _: 404 })),
  // ── pages that show private data ───────────────────────────────────────────────────────────
  row("PAGE", "/account", () => "/account", PAGE_SIGNED_IN, { effect: async ({ res, f, actor, allowed }) => {
    if (!allowed) return;
    const html = await res.text();
    expect(html).toContain(f.emails[actor]);
    if (actor !== "member") expect(html).not.toContain(f.emails.member);
  } }),
  row("PAGE", "/account/gear", () => "/account/gear", PAGE_SIGNED_IN),
  // Each member sees the status of their own submissions only.
  row("PAGE", "/account/submissions", () => "/account/submissions", PAGE_SIGNED_IN, { effect: async ({ res, f, actor, allowed }) => {
    if (allowed) expect((await res.text()).includes(f.submissionModel)).toBe(actor === "member");
  } }),
  row("PAGE", "/parts/submit", () => "/parts/submit", PAGE_SIGNED_IN),
  row("PAGE", "/review", () => "/review", PAGE_SIGNED_IN, { effect: async ({ res, f, actor, allowed }) => {
    if (!allowed) return;
    expect((await res.text()).includes(f.submissionModel)).toBe(actor === "moderator" || actor === "admin");
  } }),
  row("PAGE", "/review/builds", () => "/review/builds", PAGE_SIGNED_IN, { effect: async ({ res, actor, allowed }) => {
    if (!allowed) return;
    expect((await res.text()).includes("Only moderators look after builds.")).toBe(!(actor === "moderator" || actor === "admin"));
  } }),
  row("PAGE", "/b/[slug]", (f) => `/b/${f.privateSlug}`, { _: 404, member: 200, moderator: 200, admin: 200 }, {
    label: "private build", effect: async ({ res, f, allowed }) => { if (allowed) expect(await res.text()).toContain(f.privateTitle); },
  }),
  row("PAGE", "/b/[slug]", (f) => `/b/${f.hiddenSlug}`, { _: 404, member: 200, moderator: 200, admin: 200 }, { label: "hidden build" }),
  row("PAGE", "/b/[slug]/opengraph-image", (f) => `/b/${f.privateSlug}/opengraph-image`, { _: 404 }, { label: "private build: no preview for anyone" }),
  row("PAGE", "/dev/outbox", () => "/dev/outbox", { _: 404, admin: 200 }),
  // ── shop dashboard and orders pages ────────────────────────────────────────────────────────
  ...["/shop", "/shop/import", "/shop/inventory", "/shop/stock-next", "/shop/staff", "/shop/orders"].map((p) => row("PAGE", p, () => p, PAGE_SIGNED_IN, { effect: dashboardEffect })),
  row("PAGE", "/shop/keys", () => "/shop/keys", PAGE_SIGNED_IN, { effect: async (c) => {
    const html = await c.res.clone().text();
    await dashboardEffect(c);
    if (c.actor === "shopStaff") expect(html).toContain("Only the owner of Lantern Row Optics");
    if (c.actor === "shopOwner") expect(html).not.toContain("Only the owner of");
  } }),
  // Another shop's staff: 404 (no hint the order exists); people in no shop meet the dashboard's for-shops page.
  row("PAGE", "/shop/orders/[id]", (f) => `/shop/orders/${f.quoteId}`, { ...PAGE_SIGNED_IN, otherShopStaff: 404 }, { effect: async ({ res, f, actor, allowed }) => {
    if (allowed) expect((await res.text()).includes(f.quoteRef)).toBe(inDemoShop(actor));
  } }),
  row("PAGE", "/account/orders", () => "/account/orders", PAGE_SIGNED_IN, { effect: async ({ res, f, actor, allowed }) => {
    if (allowed) expect((await res.text()).includes(f.quoteRef)).toBe(actor === "member");
  } }),
  // The shop's people are sent on to the shop's view of the same quote.
  row("PAGE", "/quotes/[id]", (f) => `/quotes/${f.quoteId}`, { _: 404, anon: 307, banned: 307, member: 200, shopOwner: 307, shopStaff: 307 }, { effect: async ({ res, f, actor, allowed }) => {
    if (actor === "member") expect(await res.text()).toContain(f.quoteRef);
    else if (allowed) expect(res.headers.get("location")).toMatch(inDemoShop(actor) ? `/shop/orders/${f.quoteId}` : "/sign-in");
  } }),
  row("PAGE", "/quotes/new", (f) => `/quotes/new?build=${f.privateSlug}`, PAGE_SIGNED_IN, { label: "for the member's private build", effect: async ({ res, f, actor, allowed }) => {
    // Moderators see private builds (as on /b/[slug]); nobody else learns the title.
    if (allowed) expect((await res.text()).includes(f.privateTitle)).toBe(actor === "member" || actor === "moderator" || actor === "admin");
  } }),
  // An invitation link names its address to whoever holds it; only that account is offered the button.
  row("PAGE", "/shops/join/[id]", async (f) => `/shops/join/${(await f.newInvitation(f.emails.otherMember)).id}`, ANYONE, { effect: async ({ res, actor }) => {
    expect((await res.text()).includes("Accept and open the shop")).toBe(actor === "otherMember");
  } }),
];

/** Pages that show nothing private (the walk requires every page to be here or in MATRIX). */
export const PUBLIC_PAGES = [
  "/", "/plan", "/parts", "/parts/[slug]", "/builds", "/sign-in", "/sign-up", "/forgot-password", "/reset-password",
  "/shops", "/shops/[slug]",
];
