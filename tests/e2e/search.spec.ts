// Finding parts the way imagers type them, in the planner's pickers and on /parts.
import { describe, expect, it } from "vitest";
import { DESKTOP, sharedBrowser } from "../support/browser";
import { BASE_URL } from "../support/http";

describe("part search in Chromium", () => {
  const browser = sharedBrowser();

  it("Enter right after typing picks the best match, and focus moves on to the next field", async () => {
    const { page, errors } = await browser.page();
    await page.goto(`${BASE_URL}/plan`);
    const optics = page.getByRole("combobox", { name: "Optics" });
    await optics.click();
    await optics.pressSequentially("80ed", { delay: 20 });
    await optics.press("Enter");
    await page.waitForURL(/optics=corvane-optical-meridian-80-ed/);
    // A telescope was chosen, so the corrector picker appears and takes the focus.
    await page.waitForFunction(() => document.activeElement?.getAttribute("role") === "combobox");
    expect(await page.evaluate(() => document.activeElement?.id)).toBe(await page.getByRole("combobox", { name: "Corrector" }).getAttribute("id"));

    const device = page.getByRole("combobox", { name: "Add a device" });
    await device.click();
    await device.pressSequentially("carousel 7 × 2in", { delay: 15 });
    await device.press("Enter");
    await page.waitForURL(/stations=nettlebeck-instruments-carousel-7-2in(&|$)/);
    await page.waitForFunction((id) => document.activeElement?.id === id, await page.getByRole("combobox", { name: "Camera" }).getAttribute("id"));
    expect(errors).toEqual([]);
    await page.close();
  });

  it("/parts finds off-axis guiders for “guider” and T-thread parts for “T-thread”", async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await page.goto(`${BASE_URL}/parts?q=guider`);
    await page.getByRole("link", { name: /Sidelook 10\.5 OAG/ }).first().waitFor({ timeout: 15_000 });
    await page.goto(`${BASE_URL}/parts?q=${encodeURIComponent("T-thread")}`);
    await page.getByRole("link", { name: /T-thread Spacer 1 mm/ }).first().waitFor({ timeout: 15_000 });
    await page.close();
  });
});
