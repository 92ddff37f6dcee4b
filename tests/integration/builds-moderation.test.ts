import { beforeAll, describe, expect, it } from "vitest";
import type { Client } from "../support/http";
import { saveBuild, viewers, type Viewers } from "./builds-support";

let v: Viewers & { admin: Client };
beforeAll(async () => { v = await viewers(); });

const getJson = async (c: Client, slug: string) => (await c.get(`/api/v1/builds/${slug}`)).json();

describe("endorsing", () => {
  it("gives the member 403 and the moderator 200, and the build then reads as endorsed", async () => {
    const slug = await saveBuild(v.owner, "public");
    expect((await v.owner.post(`/api/v1/builds/${slug}/endorse`)).status).toBe(403);
    expect((await v.anon.post(`/api/v1/builds/${slug}/endorse`)).status).toBe(401);
    const res = await v.moderator.post(`/api/v1/builds/${slug}/endorse`);
    expect(res.status).toBe(200);
    expect((await res.json()).endorsed).toBe(true);
    const build = await getJson(v.anon, slug);
    expect(build.endorsed).toBe(true);
    expect(build.endorsedAt).toBeTruthy();

    // Endorsing twice changes nothing; withdrawing is audited.
    expect((await v.admin.post(`/api/v1/builds/${slug}/endorse`)).status).toBe(200);
    expect((await v.moderator.delete(`/api/v1/builds/${slug}/endorse`)).status).toBe(200);
    expect((await getJson(v.anon, slug)).endorsed).toBe(false);
    const { audit } = await getJson(v.moderator, slug);
    expect(audit.map((a: { action: string }) => a.action)).toEqual(["withdraw", "endorse"]);
    expect(audit[1].actor.name).toBe("Tomas Rell");
  });

  it("answers 404 to a moderator for a build that does not exist", async () => {
    expect((await v.moderator.post("/api/v1/builds/zzzzzzzz/endorse")).status).toBe(404);
  });
});

describe("hiding", () => {
  it("hides from everyone but the owner and moderators, with the reason shown to them", async () => {
    const slug = await saveBuild(v.owner, "public");
    const bad = await v.moderator.post(`/api/v1/builds/${slug}/hide`, {});
    expect(bad.status).toBe(400);
    expect((await v.moderator.post(`/api/v1/builds/${slug}/hide`, { reason: "Links to a counterfeit part" })).status).toBe(200);

    expect((await v.anon.get(`/api/v1/builds/${slug}`)).status).toBe(404);
    expect((await v.other.get(`/b/${slug}`)).status).toBe(404);
    expect((await v.anon.get(`/b/${slug}/opengraph-image`)).status).toBe(404);
    const own = await getJson(v.owner, slug);
    expect(own).toMatchObject({ hidden: true, hiddenReason: "Links to a counterfeit part" });
    const page = await (await v.owner.get(`/b/${slug}`)).text();
    expect(page).toContain("Hidden by a moderator");
    expect(page).toContain("Links to a counterfeit part");
    const list = await (await v.anon.get("/api/v1/builds?limit=100")).json();
    expect(list.items.map((b: { slug: string }) => b.slug)).not.toContain(slug);

    expect((await v.moderator.delete(`/api/v1/builds/${slug}/hide`)).status).toBe(200);
    expect((await v.anon.get(`/api/v1/builds/${slug}`)).status).toBe(200);
    const { audit } = await getJson(v.moderator, slug);
    expect(audit.map((a: { action: string }) => a.action)).toEqual(["unhide", "hide"]);
    expect(audit[1].detail.reason).toBe("Links to a counterfeit part");
  });
});

describe("forum threads", () => {
  it("attaches http(s) addresses only, once each, and shows them on the build", async () => {
    const slug = await saveBuild(v.owner, "unlisted");
    for (const url of ["javascript:alert(1)", "ftp://forum.example/t/1", "not a url", "data:text/html,hi"]) {
      expect((await v.moderator.post(`/api/v1/builds/${slug}/threads`, { url })).status, url).toBe(400);
    }
    const res = await v.moderator.post(`/api/v1/builds/${slug}/threads`, { url: "https://forum.example/t/what-do-i-need/42" });
    expect(res.status).toBe(201);
    await v.moderator.post(`/api/v1/builds/${slug}/threads`, { url: "https://forum.example/t/what-do-i-need/42" });
    const build = await getJson(v.anon, slug);
    expect(build.threads.map((t: { url: string }) => t.url)).toEqual(["https://forum.example/t/what-do-i-need/42"]);
    const { audit } = await getJson(v.moderator, slug);
    expect(audit.filter((a: { action: string }) => a.action === "thread-add")).toHaveLength(1);
  });
});

describe("listing", () => {
  it("lists public builds only, reference builds first, filterable, and all of your own with mine=1", async () => {
    const tag = `zq${Date.now()}`;
    const plain = await saveBuild(v.owner, "public", { title: `Plain ${tag}` });
    const reference = await saveBuild(v.owner, "public", { title: `Reference ${tag}` });
    const hidden = await saveBuild(v.owner, "unlisted", { title: `Unlisted ${tag}` });
    const secret = await saveBuild(v.owner, "private", { title: `Private ${tag}` });
    await v.moderator.post(`/api/v1/builds/${reference}/endorse`);

    const all = await (await v.anon.get(`/api/v1/builds?q=${tag}`)).json();
    expect(all.items.map((b: { slug: string }) => b.slug)).toEqual([reference, plain]);
    expect(all.items[0]).toMatchObject({ endorsed: true, visibility: "public", owner: { name: "Ines Varga" } });
    expect(all.items[0].sensorDistanceMm).toBeGreaterThan(50);

    const refs = await (await v.anon.get(`/api/v1/builds?q=${tag}&reference=1`)).json();
    expect(refs.items.map((b: { slug: string }) => b.slug)).toEqual([reference]);

    expect((await v.anon.get("/api/v1/builds?mine=1")).status).toBe(401);
    const mine = await (await v.owner.get(`/api/v1/builds?mine=1&q=${tag}`)).json();
    expect(mine.items.map((b: { slug: string }) => b.slug).sort()).toEqual([plain, reference, hidden, secret].sort());
    const others = await (await v.other.get(`/api/v1/builds?mine=1&q=${tag}`)).json();
    expect(others.items).toEqual([]);

    const byPart = await (await v.anon.get(`/api/v1/builds?q=${tag}+carousel`)).json();
    expect(byPart.items).toHaveLength(2);

    const page = await (await v.anon.get(`/builds?q=${tag}`)).text();
    expect(page).toContain(`Reference ${tag}`);
    expect(page).not.toContain(`Unlisted ${tag}`);
  });

  it("pages with a cursor", async () => {
    const tag = `pg${Date.now()}`;
    const made = [];
    for (let i = 0; i < 3; i++) made.push(await saveBuild(v.owner, "public", { title: `Paged ${tag} ${i}` }));
    const first = await (await v.anon.get(`/api/v1/builds?q=${tag}&limit=2`)).json();
    expect(first.items).toHaveLength(2);
    expect(first.nextCursor).toBeTruthy();
    const second = await (await v.anon.get(`/api/v1/builds?q=${tag}&limit=2&cursor=${first.nextCursor}`)).json();
    expect(second.items).toHaveLength(1);
    expect(second.nextCursor).toBeNull();
    expect([...first.items, ...second.items].map((b: { slug: string }) => b.slug)).toEqual([...made].reverse());
    expect((await v.anon.get("/api/v1/builds?cursor=!!")).status).toBe(400);
  });
});

/** Poll until `done` holds (the job worker answers within a second or two). */
async function eventually<T>(read: () => Promise<T>, done: (v: T) => boolean, timeoutMs = 20_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const v = await read();
    if (done(v) || Date.now() > deadline) return v;
    await new Promise((r) => setTimeout(r, 250));
  }
}

describe("re-check when a catalog part changes", () => {
  it("flags an endorsed build that no longer fits, says why, and recovers when the part is restored", async () => {
    const slug = await saveBuild(v.owner, "public");
    await v.moderator.post(`/api/v1/builds/${slug}/endorse`);
    const before = await getJson(v.anon, slug);
    const spacer = before.chain.steps.find((s: { role: string }) => s.role === "connector").partId as string;
    const part = await (await v.anon.get(`/api/v1/parts/${spacer}`)).json();

    try {
      const edit = await v.moderator.patch(`/api/v1/parts/${spacer}`, { lengthMm: part.lengthMm + 6 });
      expect(edit.status).toBe(200);
      expect((await edit.json()).recheck.queued).toBeGreaterThan(0);
      // The re-check runs on the job queue: wait for the worker's verdict.
      const after = await eventually(() => getJson(v.anon, slug), (b) => b.fits === false);
      expect(after.fits).toBe(false);
      expect(after.checkReason).toMatch(/now lands at [\d.]+ mm, outside/);
      expect(after.checkReason).toContain(part.name);
      expect(after.endorsed).toBe(true);
      const { audit } = await getJson(v.moderator, slug);
      expect(audit[0]).toMatchObject({ action: "recheck", detail: { fits: false } });

      const queue = await (await v.moderator.get("/review/builds")).text();
      const flaggedSection = queue.slice(queue.indexOf("no longer fit"), queue.indexOf("Recent builds"));
      expect(flaggedSection).toContain(`/b/${slug}`);
      expect((await v.owner.get("/review/builds")).status).toBe(200); // the page itself says "only moderators"
      expect(await (await v.owner.get("/review/builds")).text()).not.toContain(`/b/${slug}`);
    } finally {
      await v.moderator.patch(`/api/v1/parts/${spacer}`, { lengthMm: part.lengthMm });
    }
    const restored = await eventually(() => getJson(v.anon, slug), (b) => b.fits === true);
    expect(restored.fits).toBe(true);
    const { audit } = await getJson(v.moderator, slug);
    expect(audit.slice(0, 2).map((a: { action: string; detail: { fits: boolean } }) => [a.action, a.detail.fits])).toEqual([["recheck", true], ["recheck", false]]);
  });
});
