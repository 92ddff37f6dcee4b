import { afterAll, beforeAll } from "vitest";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { CHROMIUM_ARGS, CHROMIUM_PATH } from "@/lib/dev/chromium";
import { BASE_URL, DEMO_PASSWORD } from "./http";

export async function launch(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS, headless: true });
}

/** Collects uncaught page errors so a test can assert there were none. */
export function watchErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on("pageerror", (e) => errors.push(e.message));
  return errors;
}

export async function signInThroughForm(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
}

export const SCREENSHOTS = process.env.SCREENSHOT_DIR;

/** One Chromium for the test file; returns a maker of contexts, all closed with the browser after the file. */
export function browserContexts(viewport = { width: 1440, height: 1000 }) {
  let browser: Browser | undefined;
  const contexts: BrowserContext[] = [];
  beforeAll(async () => { browser = await launch(); });
  afterAll(async () => {
    for (const c of contexts) await c.close().catch(() => undefined);
    await browser?.close();
  });
  return async (opts: Parameters<Browser["newContext"]>[0] = {}) => {
    const c = await browser!.newContext({ viewport, ...opts });
    contexts.push(c);
    return c;
  };
}

export const DESKTOP = { width: 1440, height: 1000 };
export const PHONE = { width: 390, height: 844 };

/**
 * One Chromium for the describe block (or file) that calls it: launched before its tests,
 * closed after. `page()` opens a page (desktop size unless told) with its uncaught errors.
 */
export function sharedBrowser() {
  let browser: Browser | undefined;
  beforeAll(async () => { browser = await launch(); });
  afterAll(async () => { await browser?.close(); });
  const open = () => browser ?? Promise.reject(new Error("sharedBrowser() is used outside its describe block"));
  return {
    async page(viewport: { width: number; height: number } = DESKTOP) {
      const page = await (await open()).newPage({ viewport });
      return { page, errors: watchErrors(page) };
    },
    newPage: async (...args: Parameters<Browser["newPage"]>) => (await open()).newPage(...args),
    newContext: async (...args: Parameters<Browser["newContext"]>) => (await open()).newContext(...args),
  };
}

/** The submit form filled for an M48 spacer (female front, male rear) by "Bench Test Works"; the length only when given. */
export async function fillSpacerSubmission(page: Page, model: string, lengthMm?: string) {
  await page.goto(`${BASE_URL}/parts/submit`);
  await page.getByLabel("Kind").selectOption("spacer");
  await page.getByLabel("Maker").fill("Bench Test Works");
  await page.getByLabel("Model").fill(model);
  await page.getByLabel("Sky side (front) interface").selectOption("M48x0.75");
  await page.getByLabel("Sky side (front) gender").selectOption("female");
  await page.getByLabel("Sensor side (rear) interface").selectOption("M48x0.75");
  await page.getByLabel("Sensor side (rear) gender").selectOption("male");
  if (lengthMm !== undefined) await page.getByLabel("Optical length (mm)").fill(lengthMm);
}
