// Accessibility scans with axe-core in real Chromium. Serious and critical violations fail;
// the summary names each rule and a few of the offending elements so a failure says where.
import { AxeBuilder } from "@axe-core/playwright";
import type { BrowserContext, Page } from "playwright-core";
import { BASE_URL } from "./http";

export type Theme = "day" | "night";

/** Moderate rules we hold to as well: a skipped heading level confuses screen-reader navigation. */
const ALSO_FAIL = new Set(["heading-order", "landmark-unique", "region"]);

export type AxeProblem = { rule: string; impact: string; help: string; count: number; targets: string[] };

/** Day or night is a cookie the root layout reads, so the first paint is already in that theme. */
export async function setTheme(context: BrowserContext, theme: Theme) {
  await context.addCookies([{ name: "ty-theme", value: theme, url: BASE_URL }]);
}

export async function seriousViolations(page: Page): Promise<AxeProblem[]> {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "best-practice"]).analyze();
  return results.violations
    .filter((v) => v.impact === "serious" || v.impact === "critical" || ALSO_FAIL.has(v.id))
    .map((v) => ({ rule: v.id, impact: v.impact ?? "", help: v.help, count: v.nodes.length,
      targets: v.nodes.slice(0, 4).map((n) => `${n.target.join(" ")}${n.failureSummary ? ` — ${n.failureSummary.split("\n").slice(1, 2).join("").trim()}` : ""}`) }));
}
