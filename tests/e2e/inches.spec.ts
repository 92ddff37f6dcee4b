// The inches toggle converts the whole page: the chosen parts' cards, the filter's focus shift
// and the tolerance, not only the answer. 1 in = 25.4 mm exactly (NIST Handbook 44, App. C).
import { describe, expect, it } from "vitest";
import { sharedBrowser } from "../support/browser";
import { BASE_URL } from "../support/http";
import { FLAGSHIP_PLAN } from "../support/plans";

const plan = (unit: string) => `${FLAGSHIP_PLAN}&tol=0.3&unit=${unit}`;

describe("the inches toggle", () => {
  const browser = sharedBrowser();

  it("shows the chosen parts, the filter shift and the tolerance in inches", async () => {
    const { page, errors } = await browser.page();
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
