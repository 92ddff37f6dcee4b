// Members hear when a moderator endorses or hides their build; hidden builds cannot be endorsed.
import { beforeAll, describe, expect, it } from "vitest";
import type { Client } from "../support/http";
import { waitForMail } from "../support/http";
import { saveBuild, viewers, type Viewers } from "./builds-support";

let v: Viewers & { admin: Client };
beforeAll(async () => { v = await viewers(); });

const titleOf = async (c: Client, slug: string) => ((await (await c.get(`/api/v1/builds/${slug}`)).json()) as { title: string }).title;

describe("moderation e-mail to the build's owner", () => {
  it("tells the member their build is now a reference build, with its link", async () => {
    const slug = await saveBuild(v.owner, "public");
    expect((await v.moderator.post(`/api/v1/builds/${slug}/endorse`)).status).toBe(200);
    const mail = await waitForMail("member@trainyard.test", await titleOf(v.owner, slug));
    expect(mail.subject).toMatch(/reference build/);
    expect(mail.text).toContain(`/b/${slug}`);
  });

  it("tells the member a moderator hid their build, and why", async () => {
    const slug = await saveBuild(v.owner, "public");
    expect((await v.moderator.post(`/api/v1/builds/${slug}/hide`, { reason: "Names a part that is not sold" })).status).toBe(200);
    const mail = await waitForMail("member@trainyard.test", await titleOf(v.owner, slug));
    expect(mail.subject).toMatch(/hid your build/);
    expect(mail.text).toContain("Names a part that is not sold");
  });

  it("refuses to endorse a hidden build (409) until it is shown again", async () => {
    const slug = await saveBuild(v.owner, "public");
    await v.moderator.post(`/api/v1/builds/${slug}/hide`, { reason: "Checking the spacer stack" });
    const res = await v.moderator.post(`/api/v1/builds/${slug}/endorse`);
    expect(res.status).toBe(409);
    expect(((await res.json()) as { error: { message: string } }).error.message).toMatch(/show it again/);
    await v.moderator.delete(`/api/v1/builds/${slug}/hide`);
    expect((await v.moderator.post(`/api/v1/builds/${slug}/endorse`)).status).toBe(200);
  });
});
