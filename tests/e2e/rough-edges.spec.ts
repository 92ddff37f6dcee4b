// The rough edges a first visit hits (issue 12), each checked in Chromium.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { flagshipRequest, saveBuild } from "../integration/builds-support";
import { fillSpacerSubmission, launch, signInThroughForm } from "../support/browser";
import { BASE_URL, Client } from "../support/http";

const PDF = Buffer.from("%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n");
const bodyText = (page: Page) => page.locator("body").innerText();
const count = (hay: string, needle: string) => hay.split(needle).length - 1;

describe("rough edges in Chromium", () => {
  let browser: Browser;
  let member: Page, moderator: Page;
  let owner: Client, mod: Client;
  /** Public builds saved for this file (the test database has no demo builds). */
  let slugs: string[] = [];
  beforeAll(async () => {
    browser = await launch();
    member = await (await browser.newContext({ viewport: { width: 1440, height: 1000 } })).newPage();
    await signInThroughForm(member, "member@trainyard.test");
    moderator = await (await browser.newContext({ viewport: { width: 1440, height: 1000 } })).newPage();
    await signInThroughForm(moderator, "moderator@trainyard.test");
    [owner, mod] = await Promise.all([new Client().signIn("member@trainyard.test"), new Client().signIn("moderator@trainyard.test")]);
    slugs = [await saveBuild(owner, "public"), await saveBuild(owner, "public", { request: { ...flagshipRequest, stations: [] } })];
  });
  afterAll(async () => { await browser?.close(); });

  it("has a favicon and its own not-found page for a missing or hidden build", async () => {
    const page = await browser.newPage();
    const res = await page.goto(`${BASE_URL}/b/zzzzzzzz`);
    expect(res?.status()).toBe(404);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("This link leads nowhere");
    expect(await page.getByRole("navigation", { name: "Main" }).isVisible()).toBe(true);
    const icon = await page.locator('link[rel="icon"]').first().getAttribute("href");
    expect(icon).toBeTruthy();
    const got = await fetch(new URL(icon!, BASE_URL));
    expect(got.status).toBe(200);
    expect(got.headers.get("content-type")).toMatch(/image\/svg/);
    await page.close();
  });

  it("tells the owner of a hidden build why it has no preview; moderators get no Endorse on it", async () => {
    const slug = await saveBuild(owner, "public");
    expect((await mod.post(`/api/v1/builds/${slug}/hide`, { reason: "Checking the spacer stack" })).status).toBe(200);
    await member.goto(`${BASE_URL}/b/${slug}`);
    const text = await bodyText(member);
    expect(text).toContain("A moderator hid this build, so it has no preview image");
    expect(text).not.toContain("Private builds have no preview image");
    await moderator.goto(`${BASE_URL}/b/${slug}`);
    expect(await moderator.getByRole("button", { name: "Show again" }).isVisible()).toBe(true);
    expect(await moderator.getByRole("button", { name: /Endorse/ }).count()).toBe(0);
    await moderator.goto(`${BASE_URL}/review/builds`);
    const card = moderator.locator("li", { has: moderator.getByRole("link", { name: (await (await owner.get(`/api/v1/builds/${slug}`)).json()).title }) });
    expect(await card.getByRole("button", { name: /Endorse/ }).count()).toBe(0);
    // The queue's cards name the devices in the train.
    expect(await card.innerText()).toContain("Carousel 7 × 2in");
  });

  it("does not ask a signed-in member to sign in after the e-mail link", async () => {
    await member.goto(`${BASE_URL}/sign-in?verified=1`);
    expect(await member.getByRole("heading", { level: 1 }).textContent()).toBe("You are signed in");
    const text = await bodyText(member);
    expect(text).not.toContain("Sign in to continue");
    expect(text).toContain("Your e-mail is confirmed");
    expect(await member.getByLabel("Password").count()).toBe(0);
  });

  it("speaks plainly on the submit form, says a wrong file type once, and lists the submission's status", async () => {
    const model = `Spacer 4.2 edge ${Date.now()}`;
    await fillSpacerSubmission(member, model);
    await member.getByRole("button", { name: "Send for review" }).click();
    await member.getByText("Enter a number").first().waitFor();
    expect(await bodyText(member)).not.toMatch(/Invalid input|expected number/);

    await member.getByLabel("Optical length (mm)").fill("4.2");
    await member.getByLabel("Weight (g)").fill("31");
    await member.getByLabel(/Spec sheet/).setInputFiles({ name: "sheet.pdf", mimeType: "application/pdf", buffer: Buffer.from("just some text, not a PDF") });
    await member.getByRole("button", { name: "Send for review" }).click();
    await member.getByText("see the marked fields below").waitFor();
    const fileError = (await member.locator("#specSheet").locator("xpath=ancestor::*[self::div][1]").innerText()).split("\n").find((l) => /PDF|PNG|JPEG|type/i.test(l) && !/at most 10 MB\)$/.test(l));
    expect(fileError).toBeTruthy();
    expect(count(await bodyText(member), fileError!)).toBe(1);

    await member.getByLabel(/Spec sheet/).setInputFiles({ name: "sheet.pdf", mimeType: "application/pdf", buffer: PDF });
    await member.getByRole("button", { name: "Send for review" }).click();
    await member.getByText("A moderator will check it").waitFor();

    await member.goto(`${BASE_URL}/account/submissions`);
    const mine = member.locator("li", { hasText: model });
    expect(await mine.getAttribute("data-status")).toBe("pending");
    expect(await mine.innerText()).toContain("Waiting for a moderator");

    // The review card shows weight and whether it mounts either way round.
    await moderator.goto(`${BASE_URL}/review`);
    const card = moderator.locator("li", { hasText: model });
    const cardText = await card.innerText();
    expect(cardText).toContain("Weight 31 g");
    expect(cardText).toContain("One way round only");
    await card.getByRole("button", { name: "Approve" }).click();
    await card.waitFor({ state: "detached" });
    await member.goto(`${BASE_URL}/account/submissions`);
    expect(await member.locator("li", { hasText: model }).getAttribute("data-status")).toBe("approved");
  });

  it("writes build cards' target with its tolerance and the error in words", async () => {
    await member.goto(`${BASE_URL}/builds`);
    const text = await bodyText(member);
    expect(text).not.toContain("(±0.00)");
    expect(text).toMatch(/\d+\.\d\d ± \d\.\d\d mm/);
    expect(text).toMatch(/on target|mm from target/);
  });

  it("names interfaces as people write them: SCT 2\"-24, not 2in-24tpi", async () => {
    await member.goto(`${BASE_URL}/parts?interface=2in-24tpi`);
    await member.locator("main table").getByText('SCT 2"-24').first().waitFor();
    expect(await member.locator("main").innerText()).not.toContain("2in-24tpi");
  });

  it("gives phones lists, not sideways scrolling, for the parts table and the train", async () => {
    const phone = await (await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true })).newPage();
    await phone.goto(`${BASE_URL}/parts`);
    await phone.getByTestId("part-card").first().waitFor();
    expect(await phone.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    expect(await phone.locator("table").isVisible()).toBe(false);
    await phone.goto(`${BASE_URL}/b/${slugs[0]}`);
    expect(await phone.getByTestId("train-list-item").count()).toBeGreaterThan(3);
    expect(await phone.locator("svg[role=img]").isVisible()).toBe(false);
    expect(await phone.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  });

  it("lays out the build drawing's labels so none collide, at every width", async () => {
    for (const width of [1440, 1024, 700]) {
      const page = await browser.newPage({ viewport: { width, height: 900 } });
      for (const slug of slugs) {
        await page.goto(`${BASE_URL}/b/${slug}`);
        const problems = await page.evaluate(() => {
          const svg = document.querySelector("svg[role=img]")!;
          const box = (el: Element) => el.getBoundingClientRect();
          const hit = (a: DOMRect, b: DOMRect) => a.left < b.right - 0.5 && b.left < a.right - 0.5 && a.top < b.bottom - 0.5 && b.top < a.bottom - 0.5;
          const callouts = [...svg.querySelectorAll("[data-callout]")].map((g) => ({ text: g.querySelector("text")!, line: g.querySelector("line")! }));
          const out: string[] = [];
          for (const [i, a] of callouts.entries()) for (const [j, b] of callouts.entries()) {
            if (i < j && hit(box(a.text), box(b.text))) out.push(`“${a.text.textContent}” overlaps “${b.text.textContent}”`);
            if (i !== j && hit(box(a.line), box(b.text))) out.push(`the leader of “${a.text.textContent}” crosses “${b.text.textContent}”`);
          }
          return out;
        });
        expect(problems, `${slug} at ${width} px`).toEqual([]);
        expect(await page.locator("svg[role=img] [data-callout]").count()).toBeGreaterThan(4);
      }
      await page.close();
    }
  });
});
