// What an experienced imager sees: a missing joint is never "Reaches focus", correctors that
// join the telescope come first, a wheel's filters are offered to count, and "what to change"
// applies the change that works in one click.
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { DESKTOP, PHONE, sharedBrowser } from "../support/browser";
import { BASE_URL } from "../support/http";

const settled = (page: Page, status: string) =>
  page.waitForSelector(`#plan-answer[aria-busy="false"] [data-testid="plan-verdict"][data-status="${status}"]`, { timeout: 30_000 });

describe("the planner, read by an expert", () => {
  const browser = sharedBrowser();

  it("says a telescope that cannot take its corrector does not connect, and offers nothing to save", async () => {
    const { page, errors } = await browser.page();
    const q = new URLSearchParams({ optics: "corvane-optical-meridian-102-ed", corrector: "corvane-optical-plano-0-75-m63-reducer", camera: "quillfield-imaging-cinder-26m-cooled" });
    await page.goto(`${BASE_URL}/plan?${q}`);
    await settled(page, "no-connection");
    const verdict = (await page.getByTestId("plan-verdict").textContent()) ?? "";
    expect(verdict).toContain("Does not connect");
    expect(verdict).toContain("does not join the corrector");
    expect(verdict).not.toContain("Reaches focus");
    expect(await page.locator("#plan-alts").count()).toBe(0);
    expect(await page.getByRole("button", { name: /save/i }).count()).toBe(0);
    const checks = (await page.locator("section[aria-labelledby=plan-checks]").textContent()) ?? "";
    expect(checks).toContain("Missing joint");
    const parts = (await page.locator("section[aria-labelledby=plan-parts]").textContent()) ?? "";
    expect(parts).toContain("none in the catalog");
    expect(await page.getByText("no joint found").count()).toBeGreaterThan(0);
    expect(errors).toEqual([]);
  });

  it("marks the correctors that join the chosen telescope and lists them first", async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await page.goto(`${BASE_URL}/plan?optics=corvane-optical-meridian-115-triplet`);
    const box = page.getByRole("combobox", { name: "Corrector" });
    await box.click();
    await page.getByTestId("option-mark").first().waitFor({ timeout: 15_000 });
    const options = page.getByRole("option");
    const marks = await options.evaluateAll((els) => els.map((e) => e.querySelector('[data-testid="option-mark"]')?.textContent ?? ""));
    const firstNo = marks.findIndex((m) => m.includes("does not join"));
    const lastYes = marks.map((m) => m.includes("fits this telescope")).lastIndexOf(true);
    expect(lastYes).toBeGreaterThanOrEqual(0);
    expect(firstNo).toBeGreaterThan(lastYes); // every corrector that joins comes before any that does not
    const texts = await options.allTextContents();
    expect(texts.find((t) => t.includes("Lintel R-0.79"))).toContain("fits this telescope directly");
    expect(texts.find((t) => t.includes("Plano 0.75× M63"))).toContain("does not join this telescope");
  });

  it("asks to count the glass a wheel holds, in one click", async () => {
    const page = await browser.newPage({ viewport: PHONE });
    const q = new URLSearchParams({ optics: "corvane-optical-meridian-80-ed", corrector: "corvane-optical-plano-1-0-flattener", stations: "nettlebeck-instruments-carousel-7-2in", camera: "quillfield-imaging-cinder-26m-cooled" });
    await page.goto(`${BASE_URL}/plan?${q}`);
    await settled(page, "ok");
    const prompt = page.getByTestId("filter-prompt");
    expect(await prompt.textContent()).toContain("holds 2 mm filters");
    await prompt.getByRole("button", { name: "Count 2 mm of glass" }).click();
    await page.waitForURL((u) => u.searchParams.get("filter") === "2");
    await settled(page, "ok");
    expect(await page.getByTestId("filter-prompt").count()).toBe(0);
  });

  it("finds the two removals that make a DSLR body reach focus, and applies them", async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    const q = new URLSearchParams({ optics: "ashdown-glassworks-pennant-61", stations: "nettlebeck-instruments-sidelook-10-5-oag,nettlebeck-instruments-carousel-7-2in", camera: "sorrel-camera-co-larch-24-f-bayonet" });
    await page.goto(`${BASE_URL}/plan?${q}`);
    await settled(page, "too-long");
    const remedies = page.getByTestId("remedies");
    const both = remedies.getByRole("listitem").filter({ hasText: /Remove the .*Sidelook 10\.5 OAG and remove the .*Carousel 7/ });
    expect(await both.count()).toBe(1);
    expect(await remedies.textContent()).not.toMatch(/corrector|at most/);
    await both.getByRole("button", { name: "Do that" }).click();
    await page.waitForURL((u) => !u.searchParams.get("stations"));
    await settled(page, "ok");
  });
});
