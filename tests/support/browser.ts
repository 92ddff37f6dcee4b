import { chromium, type Browser, type Page } from "playwright-core";
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
