// On a phone the planner's answer reads as a list, sky at the top, with no sideways scrolling;
// desktops keep the to-scale flow diagram.
import { describe, expect, it } from "vitest";
import { DESKTOP, sharedBrowser, watchErrors } from "../support/browser";
import { BASE_URL } from "../support/http";
import { FLAGSHIP_PLAN as FLAGSHIP } from "../support/plans";


describe("the planner's train on a phone", () => {
  const browser = sharedBrowser();

  it("lists the train at 390 px and draws it at 1440 px", async () => {
    const phone = await (await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true })).newPage();
    const errors = watchErrors(phone);
    await phone.goto(`${BASE_URL}${FLAGSHIP}`);
    await phone.waitForSelector('#plan-answer[aria-busy="false"] [data-testid="plan-verdict"][data-status="ok"]');
    const items = phone.locator("#plan-answer").getByTestId("train-list-item");
    expect(await items.count()).toBeGreaterThan(3);
    expect(await items.first().textContent()).toMatch(/Telescope|Optics/);
    expect(await items.last().textContent()).toContain("Camera");
    expect(await phone.getByTestId("train-diagram").isVisible()).toBe(false);
    expect(await phone.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    expect(errors).toEqual([]);

    const desk = await browser.newPage({ viewport: DESKTOP });
    await desk.goto(`${BASE_URL}${FLAGSHIP}`);
    await desk.waitForSelector('#plan-answer[aria-busy="false"] [data-testid="plan-verdict"][data-status="ok"]');
    expect(await desk.getByTestId("train-diagram").isVisible()).toBe(true);
    expect(await desk.locator("#plan-answer").getByTestId("train-list-item").first().isVisible()).toBe(false);
  });
});
