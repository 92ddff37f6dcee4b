// A build page is as the build is now, whichever server process answers: the suite's app runs
// two (TRAINYARD_WORKERS=2), each with caches of its own (catalog, plans), so each check below
// asks several times at once over separate connections, which the primary spreads over both.
// An edit shows at once; a build made private, or hidden by a moderator, is gone for everyone
// who may not see it, its title and notes included, and comes back when it is listed again.
import { describe, expect, it } from "vitest";
import type { Client } from "../support/http";
import { saveBuild, viewers } from "./builds-support";

const AT_ONCE = 6;

async function pages(client: Client, slug: string): Promise<{ status: number; html: string }[]> {
  return Promise.all(Array.from({ length: AT_ONCE }, async () => {
    const res = await client.get(`/b/${slug}`);
    return { status: res.status, html: await res.text() };
  }));
}

/** Every process answers 404 to each of these visitors, with none of the build's words in it. */
async function expectGone(visitors: Client[], slug: string, words: string[]) {
  for (const who of visitors) {
    for (const p of await pages(who, slug)) {
      expect(p.status).toBe(404);
      for (const w of words) expect(p.html).not.toContain(w);
    }
  }
}

describe("the build page after a change", () => {
  it("shows an edit at once, and never shows a build made private or hidden to those who may not see it", async () => {
    const v = await viewers();
    const slug = await saveBuild(v.owner, "public");
    const before = (await (await v.anon.get(`/api/v1/builds/${slug}`)).json()) as { title: string };

    for (const p of await pages(v.anon, slug)) {
      expect(p.status).toBe(200);
      expect(p.html).toContain(before.title);
    }

    const title = `Edited flagship ${Date.now()}`;
    const notes = `Moved the wheel behind the guider ${Date.now()}.`;
    expect((await v.owner.patch(`/api/v1/builds/${slug}`, { title, notes })).status).toBe(200);
    for (const p of await pages(v.anon, slug)) {
      expect(p.status).toBe(200);
      expect(p.html).toContain(title);
      expect(p.html).toContain(notes);
      expect(p.html).not.toContain(before.title);
    }

    expect((await v.owner.patch(`/api/v1/builds/${slug}`, { visibility: "private" })).status).toBe(200);
    await expectGone([v.anon, v.other], slug, [title, notes]);
    for (const p of await pages(v.owner, slug)) {
      expect(p.status).toBe(200);
      expect(p.html).toContain(title);
    }

    expect((await v.owner.patch(`/api/v1/builds/${slug}`, { visibility: "public" })).status).toBe(200);
    for (const p of await pages(v.anon, slug)) expect(p.status).toBe(200);

    expect((await v.moderator.post(`/api/v1/builds/${slug}/hide`, { reason: "Checking the page cache" })).status).toBe(200);
    await expectGone([v.anon, v.other], slug, [title, notes]);
    for (const p of await pages(v.owner, slug)) {
      expect(p.status).toBe(200);
      expect(p.html).toContain("Hidden by a moderator");
    }

    expect((await v.moderator.delete(`/api/v1/builds/${slug}/hide`)).status).toBe(200);
    for (const p of await pages(v.anon, slug)) {
      expect(p.status).toBe(200);
      expect(p.html).toContain(title);
    }
  });
});
