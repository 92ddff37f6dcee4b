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
  shopId: string; otherShopId: string;
  /** Helpers that make a fresh target for one cell (writes must not share state across cells). */
  newBuild: (visibility: "private" | "unlisted" | "public") => Promise<string>;
  newSubmission: () => Promise<{ id: string; slug: string; model: string }>;
};

export type Cell = { f: Fixtures; actor: Actor; as: Client };
/** Runs after the request: `allowed` is whether the expected status was a success. */
export type Effect = (c: Cell & { target: string; res: Response; allowed: boolean }) => Promise<void>;
type Body = unknown | ((c: Cell) => unknown);

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

const stamp = () => `${Date.now()}-${Math.floor(Math.random() * 1e6)}`;

export const MATRIX: Row[] = [
  // ── auth (better-auth) ──────────────────────────────────────────────────────────────────────
  row("GET", "/api/auth/[...all]", () => "/api/auth/get-session", ANYONE, { label: "get-session", effect: async ({ res, actor, f }) => {
    const s = (await res.json()) as { user?: { email: string } } | null;
    if (actor === "anon") expect(s).toBeNull();
    else if (actor !== "banned") expect(s?.user?.email).toBe(f.emails[actor]);
  } }),
  row("GET", "/api/auth/[...all]", () => "/api/auth/admin/list-users", { _: 403, anon: 401, admin: 200 }, { label: "admin list-users" }),
  // Non-members get 400 from better-auth today (issue 16 item 9 asks for 403; sec): either is a refusal, and the effect check proves nothing changed.
  row("POST", "/api/auth/[...all]", () => "/api/auth/organization/update", { _: [400, 403], anon: 401, shopOwner: 200, shopStaff: 403 }, {
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
];

/** Pages that show nothing private (the walk requires every page to be here or in MATRIX). */
export const PUBLIC_PAGES = [
  "/", "/plan", "/parts", "/parts/[slug]", "/builds", "/sign-in", "/sign-up", "/forgot-password", "/reset-password",
];
