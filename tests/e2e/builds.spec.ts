// Builds in real Chromium: the demo member saves the flagship train as a link, a signed-out
// browser opens it, the demo moderator endorses it, and the preview image is a PNG.
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { DEMO_CASES } from "@/seed/catalog";
import { browserContexts, signInThroughForm, watchErrors } from "../support/browser";
import { BASE_URL } from "../support/http";

const f = DEMO_CASES.flagship;
const planQuery = new URLSearchParams({ optics: f.telescope!, corrector: f.optics, camera: f.camera, stations: f.stations.join(","), filter: String(f.filterThicknessMm), n: "1.5" });

/** Save through the planner's "Save as link" dialog, as a member does. */
async function saveFromPlanner(page: Page, title: string): Promise<string> {
  await page.goto(`${BASE_URL}/plan?${planQuery}`);
  const open = page.getByRole("button", { name: "Save as link" });
  await open.first().waitFor({ timeout: 30_000 });
  await page.waitForSelector('#plan-answer[aria-busy="false"]', { timeout: 30_000 }).catch(() => undefined);
  await open.first().click();
  const dialog = page.getByRole("dialog");
  await dialog.getByLabel("Title").fill(title);
  await dialog.getByText("Public", { exact: true }).click();
  await dialog.getByRole("button", { name: "Save build" }).click();
  const link = dialog.getByLabel("Link to this build");
  await link.waitFor({ timeout: 30_000 });
  return new URL(await link.inputValue()).pathname.split("/").pop()!;
}

describe("builds in Chromium", () => {
  const context = browserContexts();

  it("member saves, a signed-out visitor opens the link, the moderator endorses, the preview is a PNG", async () => {
    const title = `Flagship for the forum ${Date.now()}`;

    // 1. The demo member saves the chosen solution.
    const memberPage = await (await context()).newPage();
    const memberErrors = watchErrors(memberPage);
    await signInThroughForm(memberPage, "member@trainyard.test");
    const slug = await saveFromPlanner(memberPage, title);
    expect(slug).toMatch(/^[1-9A-HJ-NP-Za-km-z]{8}$/);

    // The member may not endorse.
    const refused = await memberPage.evaluate(async (s) => (await fetch(`/api/v1/builds/${s}/endorse`, { method: "POST" })).status, slug);
    expect(refused).toBe(403);

    // 2. A signed-out browser opens /b/<slug> and sees the build.
    const visitor = await context();
    const visitorPage = await visitor.newPage();
    const visitorErrors = watchErrors(visitorPage);
    const response = await visitorPage.goto(`${BASE_URL}/b/${slug}`);
    expect(response?.status()).toBe(200);
    await expect(visitorPage.getByRole("heading", { level: 1 }).textContent()).resolves.toBe(title);
    expect(await visitorPage.getByRole("img", { name: /The train from sky to sensor/ }).count()).toBe(1);
    expect(await visitorPage.getByRole("table").textContent()).toContain("to buy");
    expect(await visitorPage.getByText("Reference build").count()).toBe(0);
    expect(await visitorPage.getByRole("button", { name: "Endorse as reference" }).count()).toBe(0);

    // Its preview image is an absolute address that answers a PNG.
    const og = await visitorPage.locator('meta[property="og:image"]').getAttribute("content");
    expect(og).toMatch(/^https?:\/\/[^/]+\/b\/[^/]+\/opengraph-image/);
    const image = await visitor.request.get(og!.replace(/^https?:\/\/[^/]+/, BASE_URL));
    expect(image.status()).toBe(200);
    expect(image.headers()["content-type"]).toBe("image/png");

    // The Markdown snippet is one click away.
    await visitor.grantPermissions(["clipboard-read", "clipboard-write"], { origin: BASE_URL });
    await visitorPage.getByRole("button", { name: "Copy Markdown" }).click();
    await visitorPage.getByRole("button", { name: "Copied ✓" }).waitFor({ timeout: 5_000 });
    const copied = await visitorPage.evaluate(() => navigator.clipboard.readText());
    expect(copied).toContain(`/b/${slug}/opengraph-image`);
    expect(copied).toContain(`](${new URL(og!).origin}/b/${slug})`);

    // 3. The demo moderator endorses it from the build page.
    const modPage = await (await context()).newPage();
    const modErrors = watchErrors(modPage);
    await signInThroughForm(modPage, "moderator@trainyard.test");
    await modPage.goto(`${BASE_URL}/b/${slug}`);
    await modPage.getByRole("button", { name: "Endorse as reference" }).click();
    await modPage.getByRole("button", { name: "Withdraw endorsement" }).waitFor({ timeout: 30_000 });
    expect(await modPage.getByText("Reference build").count()).toBeGreaterThan(0);
    expect(await modPage.getByRole("heading", { name: "Audit log" }).count()).toBe(1);
    expect(await modPage.getByText("endorsed it").count()).toBe(1);

    // 4. The visitor now reads it as a reference build, and so does the API.
    await visitorPage.reload();
    await visitorPage.getByText("Reference build").first().waitFor({ timeout: 15_000 });
    const json = await (await visitor.request.get(`${BASE_URL}/api/v1/builds/${slug}`)).json();
    expect(json.endorsed).toBe(true);
    expect(await visitorPage.getByRole("heading", { name: "Audit log" }).count()).toBe(0);

    expect([...memberErrors, ...visitorErrors, ...modErrors]).toEqual([]);
  });
});
