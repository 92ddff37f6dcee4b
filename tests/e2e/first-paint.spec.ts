// The answer in the first paint: a plan link's answer is in the server's HTML, and the page
// shows it without asking the solve API; edits still go to the API.
import { describe, expect, it } from "vitest";
import { sharedBrowser } from "../support/browser";
import { BASE_URL } from "../support/http";
import { FLAGSHIP_PLAN as FLAGSHIP } from "../support/plans";


describe("the planner's first paint", () => {
  const browser = sharedBrowser();

  it("carries the solved plan in the HTML, readable without JavaScript", async () => {
    const context = await browser.newContext({ javaScriptEnabled: false });
    const page = await context.newPage();
    await page.goto(`${BASE_URL}${FLAGSHIP}`);
    expect(await page.getByTestId("plan-verdict").getAttribute("data-status")).toBe("ok");
    expect(await page.getByTestId("plan-verdict").textContent()).toMatch(/Reaches focus/);
    expect(await page.textContent("body")).toContain("Carousel 7 × 2in");
    await context.close();
  });

  it("hydrates without a solve request or part look-ups, then solves edits through the API", async () => {
    const { page, errors } = await browser.page();
    const hydration: string[] = [];
    page.on("console", (m) => { if (m.type() === "error" && /hydrat/i.test(m.text())) hydration.push(m.text()); });
    const asked: string[] = [];
    page.on("request", (r) => { if (r.url().includes("/api/v1/")) asked.push(`${r.method()} ${new URL(r.url()).pathname}`); });
    await page.goto(`${BASE_URL}${FLAGSHIP}`);
    await page.waitForLoadState("networkidle");
    await page.waitForSelector('#plan-answer[aria-busy="false"] [data-testid="plan-verdict"][data-status="ok"]');
    // "Where to buy" is a panel beside the answer that asks the shops once the answer shows;
    // nothing the answer or the form needs is asked for.
    expect(asked.filter((a) => a !== "POST /api/v1/shops/where-to-buy")).toEqual([]);
    await page.getByRole("group", { name: "Filter in the beam: thickness" }).getByRole("button", { name: "3 mm glass" }).click();
    await page.waitForRequest((r) => r.url().endsWith("/api/v1/solve") && r.method() === "POST");
    await page.waitForSelector('#plan-answer[aria-busy="false"] [data-testid="plan-verdict"]');
    expect(errors).toEqual([]);
    expect(hydration).toEqual([]);
    await page.close();
  });
});
