// Issue 16 and issue 13 (headers): the pure pieces of the defences, each with the attack it stops.
import { describe, expect, it } from "vitest";
import { safeNextPath } from "@/lib/auth/safe-next";
import { htmlSnippet, markdownSnippet } from "@/lib/builds/snippets";
import { ogSafe } from "@/lib/builds/og-text";
import { readBodyBytes, readJsonBody } from "@/lib/http/body";
import { clientAddress, parseTrustedProxies, sanitizeForwardedHeaders } from "@/lib/http/forwarded";
import { assertTrustedOrigin } from "@/lib/http/origin";
import { contentSecurityPolicy } from "@/lib/http/security-headers";

const codeOf = (fn: () => unknown) => { try { fn(); return null; } catch (e) { return (e as { code?: string }).code ?? "thrown"; } };
const asyncCodeOf = async (p: Promise<unknown>) => { try { await p; return null; } catch (e) { return (e as { code?: string }).code ?? "thrown"; } };

describe("sign-in `next` (issue 16 item 5)", () => {
  it("keeps same-site paths", () => {
    expect(safeNextPath("/b/abc123?x=1#top")).toBe("/b/abc123?x=1#top");
    expect(safeNextPath("/account/gear")).toBe("/account/gear");
  });
  it.each(["//evil.example/pwn", "/\\evil.example/pwn", "https://evil.example/", "/\t/evil.example", "/\n/evil.example", "evil.example", "javascript:alert(1)", ""])(
    "sends %j to the planner instead", (next) => {
      expect(safeNextPath(next)).toBe("/plan");
    });
  it("takes only a string (a repeated query parameter is an array)", () => {
    expect(safeNextPath(["/a", "/b"] as unknown as string)).toBe("/plan");
  });
});

describe("the client address (issue 16 item 4)", () => {
  it("ignores X-Forwarded-For unless the peer is a configured proxy", () => {
    expect(clientAddress("127.0.0.1", "203.0.113.9", null)).toBe("127.0.0.1");
    expect(clientAddress("::ffff:127.0.0.1", "203.0.113.9", parseTrustedProxies("10.0.0.0/8"))).toBe("127.0.0.1");
  });
  it("takes the nearest untrusted hop behind trusted proxies", () => {
    const trusted = parseTrustedProxies("10.0.0.0/8, 127.0.0.1");
    // The client may prepend anything; only what the proxies appended counts.
    expect(clientAddress("127.0.0.1", "6.6.6.6, 198.51.100.7, 10.1.2.3", trusted)).toBe("198.51.100.7");
    expect(clientAddress("127.0.0.1", undefined, trusted)).toBe("127.0.0.1");
  });
  it("refuses a malformed proxy list instead of trusting everyone", () => {
    expect(() => parseTrustedProxies("everyone")).toThrow(/not an IP address/);
  });
  it("strips forwarded headers from untrusted peers and sets the peer address", () => {
    const h: Record<string, string | undefined> = { "x-forwarded-for": "1.2.3.4", "x-forwarded-host": "evil.example", "x-forwarded-proto": "https", host: "127.0.0.1:3000" };
    sanitizeForwardedHeaders(h, "127.0.0.1", null);
    expect(h).toEqual({ "x-forwarded-for": "127.0.0.1", host: "127.0.0.1:3000" });
    const viaProxy: Record<string, string | undefined> = { "x-forwarded-for": "198.51.100.7", "x-forwarded-proto": "https" };
    sanitizeForwardedHeaders(viaProxy, "10.0.0.2", parseTrustedProxies("10.0.0.0/8"));
    expect(viaProxy).toEqual({ "x-forwarded-for": "198.51.100.7", "x-forwarded-proto": "https" });
  });
});

describe("reading bodies (issue 16 items 2 and 6)", () => {
  function endless(chunk = 64 * 1024) {
    let pulled = 0;
    const stream = new ReadableStream<Uint8Array>({ pull(c) { pulled += chunk; c.enqueue(new Uint8Array(chunk)); } });
    return { stream, pulled: () => pulled };
  }

  it("stops reading a body without Content-Length at the limit", async () => {
    const { stream, pulled } = endless();
    const request = new Request("http://x/", { method: "POST", body: stream, duplex: "half" } as RequestInit);
    expect(await asyncCodeOf(readBodyBytes(request, 1_000_000))).toBe("payload_too_large");
    expect(pulled()).toBeLessThan(1_500_000); // an endless body: only just past the limit was read
  });

  it("refuses a declared Content-Length past the limit before reading", async () => {
    const { stream, pulled } = endless();
    const request = new Request("http://x/", { method: "POST", body: stream, headers: { "content-length": "300000000" }, duplex: "half" } as RequestInit);
    expect(await asyncCodeOf(readBodyBytes(request, 1_000_000))).toBe("payload_too_large");
    expect(pulled()).toBeLessThanOrEqual(64 * 1024 * 2);
  });

  it("wants JSON to say it is JSON (415), then parses it", async () => {
    const post = (type: string | null, body = '{"visibility":"public"}') => new Request("http://x/", { method: "POST", body, headers: type ? { "content-type": type } : {} });
    expect(await asyncCodeOf(readJsonBody(post("text/plain")))).toBe("unsupported_media_type");
    expect(await asyncCodeOf(readJsonBody(post("application/x-www-form-urlencoded")))).toBe("unsupported_media_type");
    expect(await asyncCodeOf(readJsonBody(post(null)))).toBe("unsupported_media_type");
    expect(await readJsonBody(post("application/json; charset=utf-8"))).toEqual({ visibility: "public" });
    expect(await asyncCodeOf(readJsonBody(post("application/json", "{nope")))).toBe("bad_request:json");
  });
});

describe("trusted origins for writes (issue 16 item 2)", () => {
  const req = (method: string, headers: Record<string, string>) => new Request("http://127.0.0.1:3000/api/v1/builds", { method, headers });
  it("refuses writes from other origins, other ports of this host included", () => {
    expect(codeOf(() => assertTrustedOrigin(req("PATCH", { origin: "https://evil.example" })))).toBe("forbidden:origin");
    expect(codeOf(() => assertTrustedOrigin(req("POST", { origin: "http://127.0.0.1:9999" })))).toBe("forbidden:origin");
    expect(codeOf(() => assertTrustedOrigin(req("POST", { origin: "null" })))).toBe("forbidden:origin");
    expect(codeOf(() => assertTrustedOrigin(req("DELETE", { "sec-fetch-site": "cross-site" })))).toBe("forbidden:origin");
  });
  it("lets the site itself, scripts without a browser, and reads through", () => {
    expect(codeOf(() => assertTrustedOrigin(req("POST", { origin: "http://127.0.0.1:3000" })))).toBeNull();
    expect(codeOf(() => assertTrustedOrigin(req("POST", { origin: "http://localhost:3000" })))).toBeNull();
    expect(codeOf(() => assertTrustedOrigin(req("POST", {})))).toBeNull();
    expect(codeOf(() => assertTrustedOrigin(req("GET", { origin: "https://evil.example" })))).toBeNull();
  });
});

describe("content security policy (issue 13 item 5)", () => {
  it("allows scripts only by nonce, no eval in production, and no framing", () => {
    const csp = contentSecurityPolicy("abc123", { dev: false });
    expect(csp).toContain("script-src 'self' 'nonce-abc123' 'strict-dynamic'");
    expect(csp).not.toContain("unsafe-eval");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(contentSecurityPolicy("n", { dev: true })).toContain("'unsafe-eval'");
  });
});

describe("user text in snippets and the preview image (issue 13 item 5)", () => {
  const hostile = `</a><script>alert(1)</script>"onerror="x" ](javascript:alert(1)) ![x](http://evil.example/p.png)`;
  const url = "http://127.0.0.1:3000/b/abc123";
  const imageUrl = `${url}/opengraph-image`;
  it("escapes a title in the HTML snippet", () => {
    const html = htmlSnippet({ title: hostile, url, imageUrl, endorsed: true });
    expect(html).not.toContain("<script>");
    expect(html).not.toContain('"onerror="');
    expect(html).toContain("&lt;script&gt;");
    expect(html.match(/<a /g)).toHaveLength(2);
  });
  it("escapes a title in the Markdown snippet so it cannot add links or images", () => {
    const md = markdownSnippet({ title: hostile, url, imageUrl, endorsed: true });
    // The only unescaped link targets are the build and its image.
    const targets = [...md.matchAll(/(?<!\\)\]\(([^)]*)\)/g)].map((m) => m[1]);
    expect(new Set(targets)).toEqual(new Set([url, imageUrl]));
    expect(md).not.toMatch(/(?<!\\)<script/);
  });
  it("keeps the preview image's text plain, on one line", () => {
    expect(ogSafe("a\nb\u0000c\u0007<b>d</b>")).toBe("a bc<b>d</b>"); // JSX text: the tags stay letters, never markup
  });
});
