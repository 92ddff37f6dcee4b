// Part search finds what imagers type: spacing and punctuation forgiven, the trade's synonyms
// understood, the best match first. Synonyms are common practice in the hobby's vocabulary.
import { sql } from "drizzle-orm";
import { PgDialect } from "drizzle-orm/pg-core";
import pg from "pg";
import { describe, expect, it } from "vitest";
import { normalizedSql } from "@/db/search-sql";
import { normalizeWords } from "@/lib/search/normalize";
import { BASE_URL } from "../support/http";

type Item = { slug: string; kind: string; name: string; front: { interface: string } | null; rear: { interface: string } | null };

async function search(q: string, extra = ""): Promise<Item[]> {
  const res = await fetch(`${BASE_URL}/api/v1/parts?q=${encodeURIComponent(q)}&limit=50${extra}`);
  expect(res.status).toBe(200);
  return ((await res.json()) as { items: Item[] }).items;
}
const faces = (p: Item) => [p.front?.interface, p.rear?.interface];

describe("part search", () => {
  it("puts the exact model first: “carousel 7 × 2in” is the 7-slot wheel, not the 5-slot one", async () => {
    const items = await search("carousel 7 × 2in");
    expect(items[0].name).toBe("Nettlebeck Instruments Carousel 7 × 2in");
    expect((await search("Carousel 7 x 2in", "&kind=filter-wheel"))[0].name).toBe("Nettlebeck Instruments Carousel 7 × 2in");
  });

  it("forgives spacing and punctuation: “80ed” finds the Meridian 80 ED", async () => {
    expect((await search("80ed"))[0].name).toBe("Corvane Optical Meridian 80 ED");
    expect((await search("meridian80 ed"))[0].name).toBe("Corvane Optical Meridian 80 ED");
  });

  it("knows guider ↔ off-axis guider ↔ OAG", async () => {
    for (const q of ["guider", "off-axis guider", "OAG"]) {
      const items = await search(q);
      expect(items.length, q).toBeGreaterThanOrEqual(5);
      expect(items.every((p) => p.kind === "oag"), q).toBe(true);
    }
  });

  it("knows T-thread ↔ T2 ↔ M42×0.75, and keeps M42×1 apart", async () => {
    for (const q of ["T-thread spacer", "T2 spacer", "M42×0.75 spacer", "m42x0.75 spacer"]) {
      const items = await search(q);
      expect(items.length, q).toBeGreaterThan(3);
      expect(items.every((p) => faces(p).includes("M42x0.75")), q).toBe(true);
    }
    const m42x1 = await search("M42×1");
    expect(m42x1.length).toBeGreaterThan(0);
    expect(m42x1.every((p) => faces(p).includes("M42x1") || /M42×1/.test(p.name))).toBe(true);
  });

  it("knows 2 inch ↔ 2in ↔ 50.8 mm, and that the SCT 2\"-24 thread is not a 2-inch barrel", async () => {
    const names = async (q: string) => (await search(q, "&kind=filter-wheel")).map((p) => p.slug).sort();
    const twoIn = await names("2in wheel");
    expect(twoIn.length).toBeGreaterThan(1);
    expect(await names("2 inch filter wheel")).toEqual(twoIn);
    expect(await names("50.8 mm wheel")).toEqual(twoIn);
    const extensions = await search("2 inch extension");
    expect(extensions.length).toBeGreaterThan(0);
    expect(extensions.some((p) => faces(p).every((f) => f === "2in-24tpi"))).toBe(false);
  });

  it("knows flattener ↔ field flattener and reducer ↔ focal reducer", async () => {
    const flat = await search("field flattener");
    expect(flat.length).toBeGreaterThan(1);
    expect(flat.every((p) => /flattener/i.test(p.name))).toBe(true);
    const red = await search("focal reducer", "&kind=optics");
    expect(red.length).toBeGreaterThan(1);
    expect(red.every((p) => /reducer/i.test(p.name))).toBe(true);
  });

  it("still tells a typo from nothing: “meridan” finds Meridians, “zzqx” finds none", async () => {
    expect((await search("meridan")).every((p) => p.name.includes("Meridian"))).toBe(true);
    expect((await search("meridan")).length).toBeGreaterThan(0);
    expect(await search("zzqx")).toEqual([]);
  });

  it("pages ranked results without repeats", async () => {
    const seen = new Set<string>();
    let cursor: string | null = null;
    let pages = 0;
    do {
      const res = await fetch(`${BASE_URL}/api/v1/parts?q=spacer&limit=7${cursor ? `&cursor=${cursor}` : ""}`);
      const body = (await res.json()) as { items: Item[]; nextCursor: string | null };
      for (const p of body.items) { expect(seen.has(p.slug)).toBe(false); seen.add(p.slug); }
      cursor = body.nextCursor;
      pages++;
    } while (cursor && pages < 30);
    expect(pages).toBeGreaterThan(1);
    expect(seen.size).toBe((await search("spacer", "&limit=200")).length);
  });

  it("normalises the catalog in SQL exactly as it normalises the query in TypeScript", async () => {
    const samples = ["Carousel 7 × 2in", "M42x0.75", "Plano 1.0× Flattener", "SCT 2\"-24", "2in-24tpi", "Sidelook 10.5 OAG", "Ridgeway 0.7× XL", "50.8 mm", "T-thread 3*4", "Turnstile 48 Camera Rotator"];
    const client = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await client.connect();
    try {
      const dialect = new PgDialect();
      for (const s of samples) {
        const q = dialect.sqlToQuery(sql`select ${normalizedSql(sql`${s}::text`)} as w`);
        const { rows } = await client.query(q.sql, q.params);
        expect(rows[0].w, s).toBe(normalizeWords(s));
      }
    } finally {
      await client.end();
    }
  });
});
