// A shop's journey in Chromium: the owner imports a stock CSV (preview, then confirm), and a
// member's plan drawn from that shop's stock uses only parts it has available.
import { writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { DEMO_CASES } from "@/seed/catalog";
import { DESKTOP, sharedBrowser, signInThroughForm, watchErrors } from "../support/browser";
import { BASE_URL, signedIn } from "../support/http";

const SHOP = "kilnworth-astro-supply";
const f = DEMO_CASES.flagship;
const PLAN = `/plan?optics=${f.telescope}&corrector=${f.optics}&camera=${f.camera}&stations=${f.stations[0]}&filter=2&n=1.5168`;
const CONNECTOR = /spacer|adapter|extension|coupler/;

describe("a shop in Chromium", () => {
  const browser = sharedBrowser();

  it("imports a CSV after a preview, and a member's plan with that shop's stock uses only stocked parts", async () => {
    const csv = path.join(tmpdir(), `kiln-${Date.now()}.csv`);
    writeFileSync(csv, [
      "catalog_slug,maker,model,sku,price_cents,currency,on_hand",
      "tarrant-machining-m48-spacer-16-5-mm,,,KIL-E2E-165,7050,GBP,3",
      ",Tarrant Machining,M48 Spacer 2 mm,KIL-E2E-2,1900,GBP,4",
    ].join("\n"));

    const owner = await browser.newPage({ viewport: DESKTOP });
    const ownerErrors = watchErrors(owner);
    await signInThroughForm(owner, "kilnworth@trainyard.test");
    await owner.goto(`${BASE_URL}/shop`);
    await owner.getByRole("navigation", { name: "Shop dashboard" }).getByRole("link", { name: "Import CSV" }).click();
    await owner.waitForURL(/\/shop\/import/);
    await owner.getByLabel(/Stock file/).setInputFiles(csv);

    // The preview matches each row to a catalog part and writes nothing yet.
    await owner.getByRole("heading", { name: "Preview: nothing is written yet" }).waitFor({ timeout: 20_000 });
    const rows = owner.locator("table tbody tr");
    await expect(rows.count()).resolves.toBe(2);
    await expect(rows.nth(0).textContent()).resolves.toContain("Tarrant Machining M48 Spacer 16.5 mm");
    await expect(rows.nth(1).textContent()).resolves.toContain("Tarrant Machining M48 Spacer 2 mm");
    await owner.getByRole("button", { name: "Import 2 lines" }).click();
    await owner.getByText(/Imported 2 lines/).waitFor({ timeout: 20_000 });
    expect(ownerErrors).toEqual([]);

    // What the shop has available now (the owner's view of the API).
    const api = await signedIn("kilnworth@trainyard.test");
    const { items } = await (await api.get(`/api/v1/shops/${SHOP}/inventory`)).json();
    const available = new Set((items as { slug: string; available: number }[]).filter((i) => i.available > 0).map((i) => i.slug));
    expect(available.has("tarrant-machining-m48-spacer-16-5-mm")).toBe(true);

    // A member picks the shop under "Draw the parts from".
    const member = await browser.newPage({ viewport: DESKTOP });
    const memberErrors = watchErrors(member);
    await signInThroughForm(member, "member@trainyard.test");
    await member.goto(`${BASE_URL}${PLAN}`);
    await member.getByRole("radio", { name: /A shop's stock/ }).check();
    await member.getByRole("combobox", { name: "Shop" }).selectOption(SHOP);
    await member.waitForURL((u) => u.searchParams.get("shop") === SHOP);
    await member.waitForSelector('#plan-answer[aria-busy="false"] [data-testid="plan-verdict"][data-status="ok"]', { timeout: 30_000 });
    await expect(member.getByTestId("plan-verdict").textContent()).resolves.toContain("at Kilnworth Astro Supply");

    const bought = await member.locator("section[aria-labelledby=plan-parts] a[href^='/parts/']").evaluateAll((as) => as.map((a) => a.getAttribute("href")!.replace("/parts/", "")));
    const connectors = bought.filter((s) => CONNECTOR.test(s));
    expect(connectors.length).toBeGreaterThan(0);
    for (const slug of connectors) expect(available.has(slug), `${slug} is in stock at the shop`).toBe(true);
    // Prices are the shop's, in pounds.
    await expect(member.locator("section[aria-labelledby=plan-parts]").textContent()).resolves.toContain("£");
    // And "where to buy" names the shop as able to supply all of it.
    const wtb = member.locator("section[aria-labelledby=where-to-buy]");
    await wtb.getByText("Kilnworth Astro Supply").waitFor({ timeout: 15_000 });
    expect(memberErrors).toEqual([]);
  });

  it("gives shop staff their own shop's stock in the planner by default", async () => {
    const page = await browser.newPage({ viewport: { width: 390, height: 900 } });
    const errors = watchErrors(page);
    await signInThroughForm(page, "staff@trainyard.test");
    await page.goto(`${BASE_URL}${PLAN}`);
    await expect(page.getByRole("radio", { name: /A shop's stock/ }).isChecked()).resolves.toBe(true);
    await page.waitForSelector('#plan-answer[aria-busy="false"] [data-testid="plan-verdict"][data-status="ok"]', { timeout: 30_000 });
    await expect(page.getByTestId("plan-verdict").textContent()).resolves.toContain("at Lantern Row Optics");
    await expect(page.getByRole("combobox", { name: "Shop" }).inputValue()).resolves.toBe("lantern-row-optics");
    expect(errors).toEqual([]);
  });
});
