// The planner in real Chromium: from the home page to a solved, reloadable plan.
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { DEMO_CASES, demoCatalog } from "@/seed/catalog";
import { PHONE, sharedBrowser } from "../support/browser";
import { BASE_URL } from "../support/http";

const flagship = DEMO_CASES.flagship;
const part = (slug: string) => {
  const p = demoCatalog.find((x) => x.slug === slug);
  if (!p) throw new Error(`No demo part ${slug}`);
  return { slug, name: `${p.maker} ${p.model}`, model: p.model };
};
const telescope = part(flagship.telescope);
const corrector = part(flagship.optics);
const wheel = part(flagship.stations[0]);
const camera = part(flagship.camera);

/** Type into a picker and choose the option that names the part. */
async function choose(page: Page, picker: string, p: { slug: string; name: string }) {
  const box = page.getByRole("combobox", { name: picker });
  await box.fill(p.slug);
  const option = page.getByRole("option").filter({ hasText: p.name }).first();
  await option.waitFor({ timeout: 15_000 });
  await box.press("ArrowDown");
  await option.click();
}

/** Wait until the answer on screen is for the current question and says it lands in the window. */
async function settledInside(page: Page) {
  await page.waitForSelector('#plan-answer[aria-busy="false"] [data-testid="plan-verdict"][data-status="ok"]', { timeout: 30_000 });
  await page.waitForSelector('[data-testid="budget-strip"][data-inside="true"]', { timeout: 10_000 });
}

async function snapshot(page: Page) {
  return {
    verdict: (await page.getByTestId("plan-verdict").textContent())?.replace(/\s+/g, " ").trim(),
    nodes: await page.getByTestId("train-node").allTextContents(),
    steps: await page.locator("section[aria-labelledby=plan-steps] tbody tr").count(),
  };
}

describe("the planner in Chromium", () => {
  const browser = sharedBrowser();

  it("solves the flagship train from the home page, and the link reproduces it", async () => {
    const { page, errors } = await browser.page();
    await page.goto(BASE_URL);
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Planner" }).click();
    await page.waitForURL(/\/plan/);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe("Planner");

    await choose(page, "Optics", telescope);
    await choose(page, "Corrector", corrector);
    await page.getByRole("group", { name: "Filter in the beam: thickness" }).getByRole("button", { name: `${flagship.filterThicknessMm} mm glass` }).click();
    await choose(page, "Add a device", wheel);
    await choose(page, "Camera", camera);

    await settledInside(page);
    const verdict = await page.getByTestId("plan-verdict").textContent();
    expect(verdict).toContain("inside the window");

    // Every item from the telescope to the camera is drawn, connectors included.
    const diagram = page.getByTestId("train-diagram");
    await expect(diagram.isVisible()).resolves.toBe(true);
    const nodes = diagram.getByTestId("train-node");
    const texts = (await nodes.allTextContents()).join(" | ");
    for (const p of [telescope, corrector, wheel, camera]) expect(texts).toContain(p.model);
    expect(await diagram.locator('[data-role="connector"]').count()).toBeGreaterThan(0);
    const before = await snapshot(page);
    expect(before.nodes.length).toBe(before.steps);
    expect(await page.getByTestId("train-joint").count()).toBe(before.nodes.length - 1);

    // The choices are in the address bar.
    const url = new URL(page.url());
    expect(url.searchParams.get("optics")).toBe(telescope.slug);
    expect(url.searchParams.get("corrector")).toBe(corrector.slug);
    expect(url.searchParams.get("stations")).toBe(wheel.slug);
    expect(url.searchParams.get("camera")).toBe(camera.slug);
    expect(Number(url.searchParams.get("filter"))).toBe(flagship.filterThicknessMm);

    // A reload solves on load and shows the same plan.
    await page.reload();
    await settledInside(page);
    expect(await snapshot(page)).toEqual(before);
    expect(errors).toEqual([]);
  });

  it("keeps the chosen alternative and the unit in the link", async () => {
    const { page, errors } = await browser.page(PHONE);
    const q = new URLSearchParams({ optics: corrector.slug, camera: camera.slug, stations: wheel.slug, filter: "2", n: "1.5168" });
    await page.goto(`${BASE_URL}/plan?${q}`);
    await settledInside(page);
    const alternatives = page.getByRole("group", { name: "Choose an alternative" });
    if (await alternatives.count()) {
      await alternatives.getByRole("radio").nth(1).check({ force: true });
      await page.waitForURL((u) => u.searchParams.get("alt") === "2");
    }
    await page.getByRole("radio", { name: "Inches" }).click();
    await page.waitForURL((u) => u.searchParams.get("unit") === "in");
    const verdict = await page.getByTestId("plan-verdict").textContent();
    await page.reload();
    await settledInside(page);
    expect(await page.getByTestId("plan-verdict").textContent()).toBe(verdict);
    expect(await page.getByTestId("plan-verdict").textContent()).toContain(" in");
    expect(errors).toEqual([]);
  });
});
