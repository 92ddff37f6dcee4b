// Every main page, in day and in night mode, scanned by axe-core in Chromium: no serious or
// critical violation (WCAG 2.1 A/AA and axe best practices), at a desktop and a phone width.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, BrowserContext } from "playwright-core";
import { DEMO_CASES } from "@/seed/catalog";
import { seriousViolations, setTheme, type Theme } from "../support/axe";
import { launch, signInThroughForm } from "../support/browser";
import { saveBuild } from "../integration/builds-support";
import { BASE_URL, Client } from "../support/http";

const f = DEMO_CASES.flagship;
const FLAGSHIP = `/plan?optics=${f.telescope}&corrector=${f.optics}&camera=${f.camera}&stations=${f.stations.join(",")}&filter=${f.filterThicknessMm}&n=1.5168`;

/** A public build to scan (the test database has no demo builds: save one). */
async function publicBuildSlug(): Promise<string> {
  return saveBuild(await new Client().signIn("member@trainyard.test"), "public");
}

const ANONYMOUS = ["/", "/plan", FLAGSHIP, "/parts", `/parts/${f.camera}`, "/builds", "/sign-in", "/sign-up", "/forgot-password", "/no-such-page"];
const MEMBER = ["/account", "/account/gear", "/account/submissions", "/parts/submit"];
const MODERATOR = ["/review", "/review/builds"];

/** Waits for the page's own content: the planner's answer when a plan is in the link. */
async function settle(page: import("playwright-core").Page, path: string) {
  await page.goto(`${BASE_URL}${path}`);
  await page.waitForLoadState("networkidle");
  if (path.startsWith("/plan?")) await page.waitForSelector('#plan-answer[aria-busy="false"] [data-testid="plan-verdict"]', { timeout: 30_000 });
}

describe.each<Theme>(["day", "night"])("axe-core in %s mode", (theme) => {
  let browser: Browser;
  let build = "";
  beforeAll(async () => { browser = await launch(); build = await publicBuildSlug(); });
  afterAll(async () => { await browser?.close(); });

  async function scan(context: BrowserContext, paths: string[]) {
    await setTheme(context, theme);
    const page = await context.newPage();
    const report: Record<string, unknown> = {};
    for (const path of paths) {
      await settle(page, path);
      const problems = await seriousViolations(page);
      if (problems.length) report[path] = problems;
    }
    await page.close();
    return report;
  }

  it("finds nothing serious on the public pages at 1440 px", async () => {
    const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
    expect(await scan(context, [...ANONYMOUS, `/b/${build}`])).toEqual({});
    await context.close();
  });

  it("finds nothing serious on the public pages at 390 px", async () => {
    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
    expect(await scan(context, ["/", FLAGSHIP, "/parts", "/builds", `/b/${build}`])).toEqual({});
    await context.close();
  });

  it("finds nothing serious on a member's and a moderator's pages", async () => {
    const member = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
    await signInThroughForm(await member.newPage(), "member@trainyard.test");
    const moderator = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
    await signInThroughForm(await moderator.newPage(), "moderator@trainyard.test");
    expect({ ...(await scan(member, MEMBER)), ...(await scan(moderator, MODERATOR)) }).toEqual({});
    await member.close();
    await moderator.close();
  });
});
