import { describe, expect, it } from "vitest";
import { INTERFACE_CODES } from "@/lib/interfaces";
import { BASE_URL, Client, signedIn } from "../support/http";

type Item = { id: string; slug: string; kind: string; name: string; front: { interface: string } | null; rear: { interface: string } | null; lengthMm: number };

async function getJson(path: string) {
  const res = await fetch(`${BASE_URL}${path}`);
  return { status: res.status, body: await res.json() };
}

describe("GET /api/v1/parts", () => {
  it("pages through the whole approved catalog without repeats", async () => {
    const seen = new Set<string>();
    let cursor: string | null = null;
    let pages = 0;
    do {
      const { status, body } = await getJson(`/api/v1/parts?limit=37${cursor ? `&cursor=${cursor}` : ""}`);
      expect(status).toBe(200);
      for (const item of body.items as Item[]) {
        expect(seen.has(item.slug)).toBe(false);
        seen.add(item.slug);
      }
      cursor = body.nextCursor;
      pages++;
    } while (cursor && pages < 50);
    expect(seen.size).toBeGreaterThanOrEqual(200);
    expect(pages).toBeGreaterThan(1);
  });

  it("narrows by search words, kind and interface", async () => {
    const all = await getJson("/api/v1/parts?limit=200");
    const spacers = await getJson("/api/v1/parts?kind=spacer&limit=200");
    expect(spacers.body.items.length).toBeGreaterThan(10);
    expect(spacers.body.items.every((p: Item) => p.kind === "spacer")).toBe(true);
    const m48 = await getJson("/api/v1/parts?interface=M48x0.75&kind=spacer&limit=200");
    expect(m48.body.items.length).toBeGreaterThan(0);
    expect(m48.body.items.length).toBeLessThan(spacers.body.items.length);
    expect(m48.body.items.every((p: Item) => p.front?.interface === "M48x0.75" || p.rear?.interface === "M48x0.75")).toBe(true);
    const q = await getJson("/api/v1/parts?q=wheel&limit=200");
    expect(q.body.items.length).toBeGreaterThan(0);
    expect(q.body.items.length).toBeLessThan(all.body.items.length);
  });

  it("puts kind-specific numbers at the top level", async () => {
    const cams = await getJson("/api/v1/parts?kind=camera&limit=5");
    expect(cams.body.items[0].sensorDiagonalMm).toBeGreaterThan(5);
    const optics = await getJson("/api/v1/parts?kind=optics&limit=200");
    expect(optics.body.items.some((p: { backFocusMm?: number }) => p.backFocusMm === 55)).toBe(true);
  });

  it.each([["limit=-5", "limit"], ["limit=500", "limit"], ["limit=abc", "limit"], ["kind=spaceship", "kind"], ["interface=M99x9", "interface"], ["cursor=%25%25", "cursor"]])(
    "answers 400 with a field error for %s", async (qs, field) => {
      const { status, body } = await getJson(`/api/v1/parts?${qs}`);
      expect(status).toBe(400);
      expect(body.error.code).toMatch(/^bad_request/);
      expect(Object.keys(body.error.fields)).toContain(field);
    });

  it("finds one part by slug and 404s an unknown one", async () => {
    const { body } = await getJson("/api/v1/parts?kind=spacer&limit=1");
    const one = await getJson(`/api/v1/parts/${body.items[0].slug}`);
    expect(one.status).toBe(200);
    expect(one.body.slug).toBe(body.items[0].slug);
    expect((await getJson("/api/v1/parts/no-such-part-anywhere")).status).toBe(404);
  });

  it("serves the part page by slug", async () => {
    const { body } = await getJson("/api/v1/parts?kind=filter-wheel&limit=1");
    const res = await fetch(`${BASE_URL}/parts/${body.items[0].slug}`);
    expect(res.status).toBe(200);
    expect(await res.text()).toContain(body.items[0].model);
  });
});

describe("GET /api/v1/interfaces", () => {
  it("lists every registered code, the trade's threads and barrels among them", async () => {
    const { status, body } = await getJson("/api/v1/interfaces");
    expect(status).toBe(200);
    const codes = body.items.map((i: { code: string }) => i.code);
    expect(codes).toEqual([...INTERFACE_CODES]);
    for (const c of ["M42x0.75", "M42x1", "M48x0.75", "M54x0.75", "M63x1", "M68x1", "2in-24tpi", "barrel-1.25in", "barrel-2in"]) expect(codes).toContain(c);
  });
});

describe("moderator corrections", () => {
  it("refuses a member's edit with 403 and a visitor's with 401", async () => {
    const member = await signedIn("member@trainyard.test");
    const { body } = await getJson("/api/v1/parts?kind=spacer&limit=1");
    expect((await member.patch(`/api/v1/parts/${body.items[0].slug}`, { lengthMm: 9 })).status).toBe(403);
    expect((await new Client().patch(`/api/v1/parts/${body.items[0].slug}`, { lengthMm: 9 })).status).toBe(401);
  });

  it("rejects a bad correction with field errors and changes nothing", async () => {
    const mod = await signedIn("moderator@trainyard.test");
    const { body } = await getJson("/api/v1/parts?kind=spacer&limit=1");
    const before = body.items[0];
    const res = await mod.patch(`/api/v1/parts/${before.slug}`, { lengthMm: -3 });
    expect(res.status).toBe(400);
    expect((await res.json()).error.fields.lengthMm).toBeDefined();
    const after = await getJson(`/api/v1/parts/${before.slug}`);
    expect(after.body.lengthMm).toBe(before.lengthMm);
  });
});
