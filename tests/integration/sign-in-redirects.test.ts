// Pages for signed-in visitors answer a real 307 to sign in, even where a loading.tsx streams a
// skeleton: once streaming starts, a redirect from the page can only answer 200 and move the
// browser by script. proxy.ts sends visitors without a session cookie away before any page runs;
// a stale cookie gets past it, so the layout (or, with no loading.tsx above it, the page) must.
import { readdirSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { BASE_URL, Client } from "../support/http";
import { PUBLIC_PAGES } from "./authz/matrix";

/** Every page that sends a signed-out visitor to sign in and sits under, or beside, a loading.tsx. */
const SIGN_IN_PAGES = ["/account", "/account/gear", "/account/orders", "/account/submissions", "/review", "/review/builds", "/parts/submit"];

const APP = path.resolve(import.meta.dirname, "..", "..", "app");
const urlOf = (dir: string) => `/${path.relative(APP, dir).split(path.sep).filter((s) => s && !/^\(.*\)$/.test(s)).join("/")}`;

/** The pages (by URL) below each folder of app/ that holds a loading.tsx. */
function pagesUnderLoading(dir = APP, underLoading = false, out = new Set<string>()): Set<string> {
  const entries = readdirSync(dir, { withFileTypes: true });
  const here = underLoading || entries.some((e) => e.name === "loading.tsx");
  for (const e of entries) {
    if (e.isDirectory()) pagesUnderLoading(path.join(dir, e.name), here, out);
    else if (here && e.name === "page.tsx") out.add(urlOf(dir));
  }
  return out;
}

/** A visitor whose session cookie names no session (signed out elsewhere, expired, or made up). */
function staleSessionRequest(p: string): Promise<Response> {
  return fetch(`${BASE_URL}${p}`, { redirect: "manual", headers: { cookie: "better-auth.session_token=no-such-session.signature" } });
}

function expectSignInRedirect(res: Response, p: string) {
  expect(res.status, `${p} answers a redirect`).toBe(307);
  const to = new URL(res.headers.get("location") ?? "", BASE_URL);
  expect(to.pathname, `${p} redirects to sign in`).toBe("/sign-in");
  expect(to.searchParams.get("next"), `${p} comes back to the page asked for`).toBe(p);
}

describe("sign-in redirects under loading boundaries", () => {
  it("every page under a loading.tsx is either public or a sign-in page checked here", () => {
    const pages = [...pagesUnderLoading()];
    expect(pages.length).toBeGreaterThan(5);
    expect(pages.filter((p) => !PUBLIC_PAGES.includes(p) && !SIGN_IN_PAGES.includes(p)), "add the page to SIGN_IN_PAGES (its redirect must come from a layout above the loading.tsx)").toEqual([]);
  });

  it("the parts list's skeleton does not sit above /parts/submit or a part's page", () => {
    const pages = pagesUnderLoading();
    expect(pages.has("/parts")).toBe(true);
    expect(pages.has("/parts/submit")).toBe(false);
    expect(pages.has("/parts/[slug]")).toBe(false);
  });

  for (const p of SIGN_IN_PAGES) {
    it(`${p}: 307 to sign in without a session cookie`, async () => {
      expectSignInRedirect(await new Client().get(p), p);
    });

    it(`${p}: 307 to sign in with a cookie that names no session`, async () => {
      expectSignInRedirect(await staleSessionRequest(p), p);
    });
  }

  it("an unknown part's page answers 404 (no skeleton streamed before notFound)", async () => {
    const res = await new Client().get("/parts/no-such-part-anywhere");
    expect(res.status).toBe(404);
  });
});
