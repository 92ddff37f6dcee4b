// npm run bench:first-paint -- [base URL] — against a running production app (`npm start`):
//  1. time from navigation start to the flagship plan's answer being on screen (verdict with a
//     status), in a fresh browser context each run (no cache), median of RUNS;
//  2. the planner's first-load JavaScript: every script the /plan page's HTML loads, gzipped
//     (level 9, as a CDN would serve it), summed;
//  3. the prefetch requests each nav link causes after the home page loads (Next 16 asks for a
//     dynamic route's tree, then its head: two requests for one prefetch).
// Goals (issue 12): answer visible < 0.8 s median; first-load JS < 250 KB gzip.
import { gzipSync } from "node:zlib";
import { chromium } from "playwright-core";
import { CHROMIUM_ARGS, CHROMIUM_PATH } from "../../lib/dev/chromium";
import { EXAMPLE_PLAN_HREF as FLAGSHIP } from "../../seed/example-plan";

const BASE = process.argv[2] ?? process.env.TRAINYARD_BASE_URL ?? `http://127.0.0.1:${process.env.PORT ?? 3000}`;
const RUNS = Number(process.env.RUNS ?? 15);

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};

const browser = await chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS, headless: true });
try {
  // Warm the server once (the catalog graph is cached per catalog version in each process).
  {
    const page = await browser.newPage();
    await page.goto(`${BASE}${FLAGSHIP}`);
    await page.waitForSelector('[data-testid="plan-verdict"][data-status]', { timeout: 60_000 });
    await page.close();
  }

  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    await page.goto(`${BASE}${FLAGSHIP}`, { waitUntil: "commit" });
    await page.waitForFunction(() => !!document.querySelector('[data-testid="plan-verdict"][data-status]'), undefined, { polling: "raf", timeout: 60_000 });
    // performance.now() counts from the navigation's start, so this is time-to-answer-visible.
    times.push(await page.evaluate(() => performance.now()));
    await context.close();
  }

  // First-load JS as Next counts it: the scripts the page's HTML names (not later prefetches).
  const scripts = new Map<string, number>();
  {
    const html = await (await fetch(`${BASE}${FLAGSHIP}`)).text();
    // Modern browsers skip the noModule polyfills, so they are not counted.
    for (const m of html.matchAll(/<script(?![^>]*noModule)[^>]+src="([^"]+)"/g)) {
      const url = new URL(m[1].replace(/&amp;/g, "&"), BASE).toString();
      if (!scripts.has(url)) scripts.set(url, gzipSync(Buffer.from(await (await fetch(url)).arrayBuffer()), { level: 9 }).length);
    }
  }
  const jsKb = [...scripts.values()].reduce((a, b) => a + b, 0) / 1024;

  const prefetches = new Map<string, number>();
  {
    const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    page.on("request", (r) => {
      const h = r.headers();
      if (!h["next-router-prefetch"] && !h.rsc) return;
      const path = new URL(r.url()).pathname;
      prefetches.set(path, (prefetches.get(path) ?? 0) + 1);
    });
    await page.goto(`${BASE}/`, { waitUntil: "networkidle" });
    await page.waitForTimeout(3000);
    await context.close();
  }

  console.log(`Flagship plan link, ${RUNS} fresh loads against ${BASE}`);
  console.log(`  answer visible: median ${(median(times) / 1000).toFixed(3)} s, min ${(Math.min(...times) / 1000).toFixed(3)} s, max ${(Math.max(...times) / 1000).toFixed(3)} s (goal < 0.8 s)`);
  console.log(`  first-load JS: ${jsKb.toFixed(1)} KB gzip in ${scripts.size} scripts (goal < 250 KB)`);
  console.log(`  nav prefetches after the home page: ${[...prefetches].map(([p, n]) => `${p} ×${n}`).join(", ") || "none"}`);
} finally {
  await browser.close();
}
