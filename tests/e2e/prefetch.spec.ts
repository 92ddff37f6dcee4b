// The header's links are prefetched once each. Next 16 prefetches a dynamic page in two parts —
// the route tree (`Next-Router-Segment-Prefetch: /_tree`) and then the page's data — so a link
// shows two requests; the same part of the same link must never be fetched twice.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launch } from "../support/browser";
import { BASE_URL } from "../support/http";

describe("nav link prefetching", () => {
  let browser: Browser;
  beforeAll(async () => { browser = await launch(); });
  afterAll(async () => { await browser?.close(); });

  it("fetches each link's route tree and data once, and nothing again after a while", async () => {
    const page = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
    const prefetches: string[] = [];
    page.on("request", (r) => {
      const h = r.headers();
      if (h["next-router-prefetch"]) prefetches.push(`${new URL(r.url()).pathname} ${h["next-router-segment-prefetch"] ?? "data"}`);
    });
    await page.goto(`${BASE_URL}/`, { waitUntil: "networkidle" });
    await page.waitForTimeout(2_000);
    // Moving the pointer over the links must not fetch them again.
    for (const name of ["Planner", "Parts", "Builds"]) await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name, exact: true }).hover();
    await page.waitForTimeout(1_000);
    const nav = await page.getByRole("navigation", { name: "Main" }).getByRole("link").evaluateAll((as) => as.map((a) => new URL((a as HTMLAnchorElement).href).pathname));
    expect(nav.length).toBeGreaterThan(2);
    for (const path of nav) expect(prefetches.filter((p) => p.startsWith(`${path} `)).length, `${path}: ${prefetches.join(", ")}`).toBeLessThanOrEqual(2);
    expect(new Set(prefetches).size, prefetches.join(", ")).toBe(prefetches.length);
    await page.close();
  });
});
