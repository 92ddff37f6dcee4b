// Runs the authorization table (tests/integration/authz/matrix.ts): every row × every actor,
// and fails when a route handler or page under app/ has no row.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_CASES } from "@/seed/catalog/index";
import { Client, signedIn, uniqueEmail } from "../support/http";
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
    f = {
      clients, emails, privateSlug, privateTitle, hiddenSlug, shopId, otherShopId,
      publicSlug: await newBuild("public"), unlistedSlug: await newBuild("unlisted"),
      submissionId: submission.id, submissionSlug: submission.slug, submissionModel: submission.model,
      catalogSlug: parts[parts.length - 1].slug,
      newBuild, newSubmission,
    };
  });

  afterAll(async () => { await pool.end(); });

  for (const r of MATRIX) {
    for (const actor of ACTORS) {
      const want = expected(r.expect, actor);
      it(`${r.method} ${r.route}${r.label ? ` (${r.label})` : ""} × ${actor} → ${want.join("|")}`, async () => {
        const as = f.clients[actor];
        const cell: Cell = { f, actor, as };
        const target = await r.path(f, cell);
        const url = target.startsWith("/") ? target : `${r.route.replace(/\[slug\]/, target)}`;
        const raw = typeof r.body === "function" ? (r.body as (c: Cell) => unknown)(cell) : r.body;
        const method = r.method === "PAGE" ? "GET" : r.method;
        const res = raw instanceof FormData
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
