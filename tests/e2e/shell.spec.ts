import { describe, expect, it } from "vitest";
import { sharedBrowser, signInThroughForm, watchErrors } from "../support/browser";
import { BASE_URL } from "../support/http";

describe("the app shell in Chromium", () => {
  const browser = sharedBrowser();

  it("loads the home page and signs in as the demo member", async () => {
    const page = await browser.newPage();
    const errors = watchErrors(page);
    await page.goto(BASE_URL);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toContain("What joins this scope");
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Sign in" }).click();
    await page.waitForURL(/\/sign-in/);
    await signInThroughForm(page, "member@trainyard.test");
    await page.goto(`${BASE_URL}/account`);
    await expect(page.getByRole("heading", { name: "Your account" }).isVisible()).resolves.toBe(true);
    expect(await page.textContent("body")).toContain("member@trainyard.test");
    expect(errors).toEqual([]);
  });

  it("keeps night mode across a reload", async () => {
    const page = await browser.newPage();
    await page.goto(BASE_URL);
    await page.getByRole("button", { name: /Night/ }).click();
    expect(await page.evaluate(() => document.documentElement.dataset.theme)).toBe("night");
    await page.reload();
    expect(await page.evaluate(() => document.documentElement.dataset.theme)).toBe("night");
    const bg = await page.evaluate(() => getComputedStyle(document.body).backgroundColor);
    expect(bg).toBe("rgb(0, 0, 0)");
  });
});
