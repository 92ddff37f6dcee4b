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
