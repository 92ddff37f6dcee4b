// Runs the authorization table (tests/integration/authz/matrix.ts): every row × every actor,
// and fails when a route handler or page under app/ has no row.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { TEST_CARDS } from "@/lib/dev/stripe-fake";
import { DEMO_CASES } from "@/seed/catalog/index";
import { DEMO_SHOP } from "@/seed/accounts";
import { Client, signedIn, uniqueEmail, waitForMailQueue } from "../support/http";
import { addShopMember, createShop, createUser, demoShopId, setBanned, testDb } from "../support/seed-users";
import { ACTORS, type Actor, type Cell, expected, type Fixtures, MATRIX, PUBLIC_PAGES, saveBuild, submissionForm } from "./authz/matrix";

const APP = path.resolve(import.meta.dirname, "..", "..", "app");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

/** app/api/v1/builds/[slug]/route.ts → "/api/v1/builds/[slug]" (route groups dropped). */
function routeOf(file: string): string {
  const dir = path.relative(APP, path.dirname(file)).split(path.sep).filter((s) => s && !/^\(.*\)$/.test(s));
  return `/${dir.join("/")}`;
}

function walk(dir: string, out: string[] = []): string[] {
  for (const e of readdirSync(dir, { withFileTypes: true })) {
    const p = path.join(dir, e.name);
    if (e.isDirectory()) walk(p, out);
    else out.push(p);
  }
  return out;
}

/** The HTTP methods a route.ts exports (const, function, or a destructured `export const { GET, POST }`). */
function exportedMethods(source: string): string[] {
  const found = new Set<string>();
  for (const m of source.matchAll(/export\s+(?:async\s+)?(?:const|function)\s+(GET|POST|PUT|PATCH|DELETE)\b/g)) found.add(m[1]);
  for (const m of source.matchAll(/export\s+const\s*\{([^}]*)\}/g)) for (const name of m[1].split(",").map((s) => s.trim())) if ((METHODS as readonly string[]).includes(name)) found.add(name);
  return [...found];
}

const files = walk(APP);
const handlers = files.filter((f) => path.basename(f) === "route.ts").flatMap((f) => exportedMethods(readFileSync(f, "utf8")).map((m) => `${m} ${routeOf(f)}`));
const pages = files.filter((f) => /^(page|opengraph-image)\.tsx$/.test(path.basename(f))).map((f) => {
  const r = routeOf(f);
  return path.basename(f).startsWith("opengraph-image") ? `${r === "/" ? "" : r}/opengraph-image` : r;
});

describe("every route has a row", () => {
  it("each exported handler of each app/**/route.ts has a row in the authorization matrix", () => {
    const covered = new Set(MATRIX.filter((r) => r.method !== "PAGE").map((r) => `${r.method} ${r.route}`));
    expect(handlers.length).toBeGreaterThan(10);
    expect(handlers.filter((h) => !covered.has(h)), "add one row per missing handler to tests/integration/authz/matrix.ts").toEqual([]);
  });

  it("each page is in the matrix or listed as public", () => {
    const covered = new Set([...MATRIX.filter((r) => r.method === "PAGE").map((r) => r.route), ...PUBLIC_PAGES]);
    expect(pages.filter((p) => !covered.has(p)), "add a PAGE row (or, when it shows nothing private, a PUBLIC_PAGES entry)").toEqual([]);
  });

  it("no row names a route that no longer exists", () => {
    const known = new Set([...handlers, ...pages.map((p) => `PAGE ${p}`)]);
    expect(MATRIX.map((r) => `${r.method} ${r.route}`).filter((k) => !known.has(k))).toEqual([]);
  });
});

describe("authorization matrix", () => {
  let f: Fixtures;
  const openCheckouts: string[] = [];
  const { db, pool } = testDb();

  beforeAll(async () => {
    const tag = `${Date.now()}`;
    const emails: Record<Actor, string> = {
      anon: "", member: "member@trainyard.test", moderator: "moderator@trainyard.test", admin: "admin@trainyard.test", shopOwner: "shop@trainyard.test",
      otherMember: uniqueEmail("matrix-other"), banned: uniqueEmail("matrix-banned"), shopStaff: uniqueEmail("matrix-staff"), otherShopStaff: uniqueEmail("matrix-elsewhere"),
    };
    const ids = {
      otherMember: await createUser(db, { email: emails.otherMember, name: "Olek Marsh" }),
      banned: await createUser(db, { email: emails.banned, name: "Bram Ostrow" }),
      shopStaff: await createUser(db, { email: emails.shopStaff, name: "Sela Finch" }),
      otherShopStaff: await createUser(db, { email: emails.otherShopStaff, name: "Ivo Tarn" }),
    };
    const shopId = await demoShopId(db);
    await addShopMember(db, shopId, ids.shopStaff, "staff");
    const otherShopId = await createShop(db, `Dunmore Glassworks ${tag}`);
    await addShopMember(db, otherShopId, ids.otherShopStaff, "staff");
    const sql = async <T = Record<string, unknown>>(text: string, values: unknown[] = []) => (await pool.query(text, values)).rows as T[];
    // A shop as the app makes them has a profile (its currency); the demo shop has one from the seed.
    await sql("insert into shop_profiles (organization_id, currency) values ($1, 'USD') on conflict do nothing", [otherShopId]);
    const inviteShopId = await createShop(db, `Matrix Invitations ${tag}`);

    const clients = { anon: new Client() } as Record<Actor, Client>;
    for (const a of ACTORS) if (a !== "anon") clients[a] = await signedIn(emails[a]);
    // Banned after signing in: the session row stays, and must still be worth nothing.
    await setBanned(db, ids.banned);

    const member = clients.member;
    const newBuild = (visibility: "private" | "unlisted" | "public") => saveBuild(member, visibility);
    const newSubmission = async () => {
      const model = `Matrix spacer ${Date.now()}-${Math.floor(Math.random() * 1e6)}`;
      const res = await member.request("/api/v1/submissions", { method: "POST", body: submissionForm(model) });
      if (res.status !== 201) throw new Error(`submission failed: ${res.status} ${await res.text()}`);
      const { id, slug } = (await res.json()) as { id: string; slug: string };
      return { id, slug, model };
    };
    const privateSlug = await newBuild("private");
    const privateTitle = ((await (await member.get(`/api/v1/builds/${privateSlug}`)).json()) as { title: string }).title;
    const hiddenSlug = await newBuild("public");
    expect((await clients.moderator.post(`/api/v1/builds/${hiddenSlug}/hide`, { reason: "Matrix fixture: hidden" })).status).toBe(200);
    const submission = await newSubmission();
    // A camera no saved build uses: correcting it re-checks nothing, so the matrix stays quick.
    const parts = ((await (await clients.anon.get("/api/v1/parts?kind=camera&limit=50")).json()) as { items: { slug: string }[] }).items
      .filter((p) => !(Object.values(DEMO_CASES) as { camera?: string }[]).some((c) => c.camera === p.slug));
    const userIds = { ...ids } as Fixtures["userIds"];
    for (const a of ["member", "moderator", "admin", "shopOwner"] as const) {
      userIds[a] = (await sql<{ id: string }>(`select id from "user" where email = $1`, [emails[a]]))[0].id;
    }
    const quoteBuild = await newBuild("unlisted");
    const quoteStatus = async (id: string) => (await sql<{ status: string }>("select status from quotes where id = $1", [id]))[0].status;
    const quoteLines = async (id: string) => ((await (await clients.shopOwner.get(`/api/v1/quotes/${id}`)).json()) as { lines: { id: string; quantity: number; unitPriceCents: number }[] }).lines;
    const newQuote = async (state: "requested" | "quoted" | "awaiting" | "paid") => {
      const res = await member.post("/api/v1/quotes", { build: quoteBuild, shop: DEMO_SHOP.slug, note: "Matrix fixture" });
      if (res.status !== 201) throw new Error(`quote request failed: ${res.status} ${await res.text()}`);
      const { id } = (await res.json()) as { id: string };
      if (state === "requested") return id;
      // One unit of the first line only, so the demo shop's shelves barely move (and are put back below).
      const lines = (await quoteLines(id)).map((l, i) => ({ id: l.id, quantity: i === 0 ? 1 : 0, unitPriceCents: l.unitPriceCents }));
      const answered = await clients.shopOwner.post(`/api/v1/quotes/${id}/answer`, { lines, shippingCents: 0, validDays: 7 });
      if (answered.status !== 200) throw new Error(`answer failed: ${answered.status} ${await answered.text()}`);
      if (state === "quoted") return id;
      const checkout = await member.post(`/api/v1/quotes/${id}/checkout`);
      if (checkout.status !== 201) throw new Error(`checkout failed: ${checkout.status} ${await checkout.text()}`);
      const { url } = (await checkout.json()) as { url: string };
      openCheckouts.push(id);
      if (state === "awaiting") return id;
      const paid = await fetch(url, { method: "POST", body: new URLSearchParams({ card: TEST_CARDS.succeeds }), redirect: "manual" });
      if (paid.status !== 303) throw new Error(`payment failed: ${paid.status}`);
      for (let i = 0; i < 50 && (await quoteStatus(id)) !== "paid"; i++) {
        await member.get(`/api/v1/quotes/${id}`);
        await new Promise((r) => setTimeout(r, 100));
      }
      expect(await quoteStatus(id)).toBe("paid");
      // Put the sold unit back on the demo shop's shelf: later tests count on its stock.
      await sql("update shop_inventory i set on_hand = i.on_hand + l.quantity from quote_lines l where l.quote_id = $1 and l.quantity > 0 and i.id = l.inventory_id", [id]);
      return id;
    };
    const quoteId = await newQuote("requested");
    const quoteRef = (await sql<{ ref: string }>("select ref from quotes where id = $1", [quoteId]))[0].ref;
    const awaitingQuoteId = await newQuote("awaiting");
    const awaitingSessionId = (await sql<{ checkout_session_id: string }>("select checkout_session_id from quotes where id = $1", [awaitingQuoteId]))[0].checkout_session_id;
    const stockedSlug = ((await (await clients.shopOwner.get(`/api/v1/shops/${DEMO_SHOP.slug}/inventory`)).json()) as { items: { slug: string }[] }).items[0].slug;
    const newShopStaffMember = async () => {
      const userId = await createUser(db, { email: uniqueEmail("matrix-leaver"), name: "Corin Vale" });
      await addShopMember(db, shopId, userId, "staff");
      return (await sql<{ id: string }>("select id from member where organization_id = $1 and user_id = $2", [shopId, userId]))[0].id;
    };
    const newInvitation = async (email: string) => {
      const id = crypto.randomUUID();
      await sql("insert into invitation (id, organization_id, email, role, status, expires_at, inviter_id) values ($1, $2, $3, 'staff', 'pending', now() + interval '2 days', $4)", [id, inviteShopId, email, userIds.shopOwner]);
      return { id, shopId: inviteShopId };
    };
    f = {
      clients, emails, privateSlug, privateTitle, hiddenSlug, shopId, otherShopId, shopSlug: DEMO_SHOP.slug, stockedSlug,
      quoteId, quoteRef, awaitingQuoteId, awaitingSessionId, userIds, sql, newQuote, quoteLines, quoteStatus, newShopStaffMember, newInvitation,
      publicSlug: await newBuild("public"), unlistedSlug: await newBuild("unlisted"),
      submissionId: submission.id, submissionSlug: submission.slug, submissionModel: submission.model,
      catalogSlug: parts[parts.length - 1].slug,
      newBuild, newSubmission,
    };
  });

  afterAll(async () => {
    // Release whatever the matrix left reserved (an open payment holds stock for half an hour).
    for (const id of openCheckouts) await f?.clients.member.delete(`/api/v1/quotes/${id}/checkout`);
    await waitForMailQueue();
    await pool.end();
  });

  for (const r of MATRIX) {
    for (const actor of ACTORS) {
      const want = expected(r.expect, actor);
      it(`${r.method} ${r.route}${r.label ? ` (${r.label})` : ""} × ${actor} → ${want.join("|")}`, async () => {
        const as = f.clients[actor];
        const cell: Cell = { f, actor, as };
        const target = await r.path(f, cell);
        const url = target.startsWith("/") ? target : `${r.route.replace(/\[slug\]/, target)}`;
        const raw = typeof r.body === "function" ? await (r.body as (c: Cell & { target: string }) => unknown)({ ...cell, target }) : r.body;
        const method = r.method === "PAGE" ? "GET" : r.method;
        const res = raw instanceof FormData || raw instanceof Blob
          ? await as.request(url, { method, body: raw })
          : await as.request(url, { method, ...(raw === undefined ? {} : { json: raw }) });
        expect(want, `${method} ${url} as ${actor} answered ${res.status}`).toContain(res.status);
        await r.effect?.({ ...cell, target, res, allowed: res.status < 300 });
      });
    }
  }
});

describe("bans", () => {
  it("an admin's ban through better-auth ends the banned member's session at once", async () => {
    const { db, pool } = testDb();
    try {
      const email = uniqueEmail("matrix-ban");
      const userId = await createUser(db, { email, name: "Hale Corran" });
      const victim = await signedIn(email);
      expect((await victim.get("/api/v1/gear")).status).toBe(200);
      const admin = await signedIn("admin@trainyard.test");
      expect((await admin.post("/api/auth/admin/ban-user", { userId, banReason: "test" })).status).toBe(200);
      expect((await victim.get("/api/v1/gear")).status).toBe(401);
      expect((await new Client().post("/api/auth/sign-in/email", { email, password: process.env.DEMO_PASSWORD ?? "trainyard-demo" })).status).toBe(403);
    } finally {
      await pool.end();
    }
  });
});
