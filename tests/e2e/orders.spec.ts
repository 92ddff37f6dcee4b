// Orders in real Chromium: the demo member asks the demo shop for a quote from a saved build,
// the shop answers, the member pays with the succeeding test card on the payment fake's page,
// and both see the order paid and the shop's shelf count reduced.
import path from "node:path";
import pg from "pg";
import { afterAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { TEST_CARDS } from "@/lib/dev/stripe-fake";
import { SCREENSHOTS, browserContexts, signInThroughForm, watchErrors } from "../support/browser";
import { BASE_URL } from "../support/http";
import { flagshipRequest } from "../integration/builds-support";

const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 2 });
const shot = async (page: Page, name: string) => { if (SCREENSHOTS) await page.screenshot({ path: path.join(SCREENSHOTS, `orders-${name}.png`), fullPage: true }); };

async function shelf(sku: string) {
  const { rows } = await pool.query(`select on_hand as "onHand", reserved from shop_inventory i join organization o on o.id = i.organization_id where o.slug = 'lantern-row-optics' and i.sku = $1`, [sku]);
  return rows[0] as { onHand: number; reserved: number };
}

describe("orders in Chromium", () => {
  const context = browserContexts({ width: 1366, height: 900 });
  afterAll(async () => { await pool.end(); });

  it("member requests a quote, the shop answers, the member pays on the fake's page, both see it paid and the stock reduced", async () => {
    const member = await (await context()).newPage();
    const memberErrors = watchErrors(member);
    await signInThroughForm(member, "member@trainyard.test");
    const title = `Flagship to order ${Date.now()}`;
    const slug = await member.evaluate(async ({ title, request }) => {
      const res = await fetch("/api/v1/builds", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ title, visibility: "unlisted", request, solutionIndex: 0 }) });
      return ((await res.json()) as { slug: string }).slug;
    }, { title, request: flagshipRequest });

    // 1. From the build page to the quote request.
    await member.goto(`${BASE_URL}/b/${slug}`);
    await member.getByRole("link", { name: "Ask a shop for a quote" }).click();
    await member.getByRole("heading", { name: "Ask a shop for a quote" }).waitFor();
    await member.getByRole("radio", { name: /Lantern Row Optics/ }).check();
    await member.getByLabel("Note to the shop (optional)").fill("Could these ship before the new moon?");
    await shot(member, "1-request");
    await member.getByRole("button", { name: "Send the quote request" }).click();
    await member.waitForURL(/\/quotes\/[\w-]+\?sent=1/);
    const quoteUrl = member.url().split("?")[0];
    await member.getByText("Quote requested").first().waitFor();
    const ref = (await member.locator("span.code").first().textContent())!.trim();
    expect(ref).toMatch(/^Q-[2-9A-Z]{6}$/);
    await shot(member, "2-requested");

    // 2. The shop answers from its orders page.
    const shop = await (await context()).newPage();
    const shopErrors = watchErrors(shop);
    await signInThroughForm(shop, "shop@trainyard.test");
    await shop.goto(`${BASE_URL}/shop/orders`);
    await shot(shop, "3-shop-list");
    await shop.getByRole("link", { name: ref }).click();
    await shop.getByRole("form", { name: "Your quote" }).waitFor();
    const firstSku = (await shop.locator("form td .code").first().textContent())!.trim();
    const before = await shelf(firstSku);
    await shop.getByLabel("Shipping (USD)").fill("7.50");
    await shop.getByLabel("Valid for (days)").fill("10");
    await shop.getByLabel("Note to the buyer (optional)").fill("All in stock; ships Monday.");
    await shot(shop, "4-shop-editor");
    await shop.getByRole("button", { name: "Send the quote" }).click();
    await shop.getByText("Quote sent.").waitFor();
    const quotedTotal = (await shop.getByTestId("editor-total").textContent())!.trim();

    // 3. The member pays on the fake's hosted page with the succeeding test card.
    await member.goto(quoteUrl);
    await member.getByText("All in stock; ships Monday.").waitFor();
    expect((await member.getByTestId("quote-total").textContent())!.trim()).toBe(quotedTotal);
    await shot(member, "5-quoted");
    await member.getByRole("button", { name: /Accept and pay/ }).click();
    await member.getByText("LOCAL PAYMENT FAKE", { exact: false }).waitFor({ timeout: 30_000 });
    expect((await shelf(firstSku)).reserved).toBeGreaterThan(before.reserved);
    await member.getByLabel("Test card number").fill(TEST_CARDS.succeeds);
    await shot(member, "6-fake-page");
    await member.getByRole("button", { name: /^Pay / }).click();
    await member.waitForURL(/\/quotes\/[\w-]+\?paid=/);
    await member.getByText("Paid.", { exact: false }).first().waitFor();
    expect(await member.locator('[data-status="paid"]').count()).toBeGreaterThan(0);
    await shot(member, "7-paid");

    // 4. Both see it paid; the shop's shelf count went down by what was sold.
    const after = await shelf(firstSku);
    expect(after.reserved).toBe(before.reserved);
    expect(after.onHand).toBeLessThan(before.onHand);
    await shop.goto(`${BASE_URL}/shop/orders`);
    const row = shop.getByRole("row", { name: new RegExp(ref) });
    expect(await row.locator('[data-status="paid"]').count()).toBe(1);
    await shot(shop, "8-shop-list-paid");
    await row.getByRole("link", { name: ref }).click();
    await shop.getByRole("button", { name: "Mark shipped" }).waitFor();
    const shelfCell = shop.getByRole("row", { name: new RegExp(firstSku) }).locator("td").nth(2);
    expect((await shelfCell.textContent())!.trim()).toBe(String(after.onHand));
    await shot(shop, "9-shop-paid");
    await member.goto(`${BASE_URL}/account/orders`);
    expect(await member.getByRole("row", { name: new RegExp(ref) }).locator('[data-status="paid"]').count()).toBe(1);
    await shot(member, "10-account-orders");

    expect([...memberErrors, ...shopErrors]).toEqual([]);
  });
});
