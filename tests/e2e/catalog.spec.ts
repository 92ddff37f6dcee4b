// The catalog in Chromium: a member submits a part through the form with a spec sheet, a
// moderator approves it from the review queue, and it appears in the searchable table.
import { describe, expect, it } from "vitest";
import { fillSpacerSubmission, sharedBrowser, signInThroughForm, watchErrors } from "../support/browser";
import { BASE_URL } from "../support/http";

const PDF = Buffer.from("%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n");

describe("catalog in Chromium", () => {
  const browser = sharedBrowser();

  it("a member submits a spacer, the moderator approves it, the table finds it", async () => {
    const model = `Spacer 13.75 e2e ${Date.now()}`;
    const member = await (await browser.newContext()).newPage();
    const errors = watchErrors(member);
    await signInThroughForm(member, "member@trainyard.test");
    await fillSpacerSubmission(member, model, "13.75");

    // Without a spec sheet the form says what is missing and sends nothing.
    await member.getByRole("button", { name: "Send for review" }).click();
    await expect(member.getByText("Attach the maker's spec sheet").isVisible()).resolves.toBe(true);

    await member.getByLabel(/Spec sheet/).setInputFiles({ name: "sheet.pdf", mimeType: "application/pdf", buffer: PDF });
    await member.getByRole("button", { name: "Send for review" }).click();
    await member.getByText("A moderator will check it").waitFor();
    expect(errors).toEqual([]);

    const mod = await (await browser.newContext()).newPage();
    await signInThroughForm(mod, "moderator@trainyard.test");
    await mod.goto(`${BASE_URL}/review`);
    const card = mod.locator("li", { hasText: model });
    await card.getByRole("button", { name: "Approve" }).click();
    await card.waitFor({ state: "detached" });

    const visitor = await (await browser.newContext()).newPage();
    await visitor.goto(`${BASE_URL}/parts?q=${encodeURIComponent("13.75 e2e")}`);
    await visitor.getByRole("link", { name: new RegExp(model) }).waitFor();
    expect(new URL(visitor.url()).searchParams.get("q")).toBe("13.75 e2e");
  });
});
