// The inches toggle converts the whole page: the chosen parts' cards, the filter's focus shift
// and the tolerance, not only the answer. 1 in = 25.4 mm exactly (NIST Handbook 44, App. C).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { DEMO_CASES } from "@/seed/catalog";
import { launch, watchErrors } from "../support/browser";
import { BASE_URL } from "../support/http";

const f = DEMO_CASES.flagship;
const plan = (unit: string) => `/plan?optics=${f.telescope}&corrector=${f.optics}&camera=${f.camera}&stations=${f.stations.join(",")}&filter=2&n=1.5168&tol=0.3&unit=${unit}`;

describe("the inches toggle", () => {
  let browser: Browser;
  beforeAll(async () => { browser = await launch(); });
  afterAll(async () => { await browser?.close(); });

  it("shows the chosen parts, the filter shift and the tolerance in inches", async () => {
    const page = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
    const errors = watchErrors(page);
    await page.goto(`${BASE_URL}${plan("in")}`);
    await page.waitForSelector('#plan-answer[aria-busy="false"] [data-testid="plan-verdict"]');
    const form = page.getByRole("list", { name: "The train, from sky to sensor" });
    await expect(form.textContent()).resolves.toMatch(/\d\.\d{3} in to the sensor/);
    await expect(form.textContent()).resolves.not.toMatch(/\d mm to the sensor/);
    // 2 mm of N-BK7 (n = 1.5168, SCHOTT via refractiveindex.info) shifts focus 0.681 mm = 0.027 in.
    await expect(page.getByText(/pushes focus back/).first().textContent()).resolves.toContain("0.027 in");
    // ±0.3 mm = ±0.012 in.
    await expect(page.getByText(/Leave empty to use the corrector maker/).textContent()).resolves.toContain("0.012 in");
    await page.goto(`${BASE_URL}${plan("mm")}`);
    await page.waitForSelector('#plan-answer[aria-busy="false"] [data-testid="plan-verdict"]');
    await expect(page.getByText(/pushes focus back/).first().textContent()).resolves.toContain("0.68 mm");
    expect(errors).toEqual([]);
    await page.close();
  });
});
