// Issue 13 item 5 and issue 16 item 5 in real Chromium: the pages work under the nonce CSP
// (no violation, the planner's React Flow diagram draws), and sign-in never leaves the site.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { DEMO_CASES } from "@/seed/catalog";
import { launch, SCREENSHOTS, watchErrors } from "../support/browser";
import { BASE_URL, DEMO_PASSWORD } from "../support/http";

const f = DEMO_CASES.flagship;
const flagshipPlan = `/plan?optics=${f.telescope}&corrector=${f.optics}&camera=${f.camera}&stations=${f.stations.join(",")}&filter=2`;

let browser: Browser;
beforeAll(async () => { browser = await launch(); });
afterAll(async () => { await browser?.close(); });

/** Chromium reports CSP violations on the console and as securitypolicyviolation events. */
async function watchCsp(page: Page): Promise<string[]> {
  const violations: string[] = [];
  page.on("console", (m) => { if (/Content Security Policy/i.test(m.text())) violations.push(m.text()); });
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => console.log(`Content Security Policy violation: ${e.violatedDirective} ${e.blockedURI}`));
  });
  return violations;
}

describe("pages under the Content-Security-Policy", () => {
  it.each(["/", flagshipPlan, "/parts", "/builds", "/sign-in"])("%s renders and runs its scripts with no violation", async (path) => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    const violations = await watchCsp(page);
    const errors = watchErrors(page);
    const res = await page.goto(`${BASE_URL}${path}`, { waitUntil: "networkidle" });
    expect(res?.headers()["content-security-policy"]).toContain("'strict-dynamic'");
    if (path === flagshipPlan) {
      // React Flow drew the train (client-side script ran) and the answer arrived.
      await page.waitForSelector('[data-testid="train-node"]', { timeout: 30_000 });
      await page.waitForSelector('[data-testid="plan-verdict"][data-status="ok"]', { timeout: 30_000 });
      if (SCREENSHOTS) await page.screenshot({ path: `${SCREENSHOTS}/csp-planner.png`, fullPage: false });
    } else {
      // Hydrated: React attached its handlers (the night toggle is a client component).
      await page.waitForFunction(() => document.querySelector("main") !== null);
    }
    expect(violations).toEqual([]);
    expect(errors).toEqual([]);
    await page.close();
  });
});

describe("sign-in `next`", () => {
  it.each(["//evil.example/pwn", "/\\evil.example/pwn"])("stays on the site for next=%s", async (next) => {
    const page = await browser.newPage();
    await page.goto(`${BASE_URL}/sign-in?next=${encodeURIComponent(next)}`);
    await page.getByLabel("E-mail").fill("member@trainyard.test");
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"), { timeout: 30_000 });
    const url = new URL(page.url());
    expect(url.origin).toBe(new URL(BASE_URL).origin);
    expect(url.pathname).toBe("/plan");
    await page.close();
  });

  it("still follows a same-site next", async () => {
    const page = await browser.newPage();
    await page.goto(`${BASE_URL}/sign-in?next=${encodeURIComponent("/account/gear")}`);
    await page.getByLabel("E-mail").fill("member@trainyard.test");
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => u.pathname === "/account/gear", { timeout: 30_000 });
    await page.close();
  });
});
