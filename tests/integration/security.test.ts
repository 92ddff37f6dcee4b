// Issue 16: each attack from the report, against the running production build.
import http from "node:http";
import { describe, expect, it } from "vitest";
import { makeCatalog, makeRequests } from "../bench/catalog";
import { BASE_URL, Client, signedIn } from "../support/http";
import { flagshipRequest, saveBuild } from "./builds-support";

const PDF = new TextEncoder().encode("%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n");

/** A part submission's multipart form: a small spacer and its spec sheet. */
function partForm(model: string, lengthMm: number, sheet: { bytes: Uint8Array; type: string; name: string } = { bytes: PDF, type: "application/pdf", name: "s.pdf" }) {
  const form = new FormData();
  form.set("part", JSON.stringify({ kind: "spacer", maker: "Test Bench Works", model: `${model} ${Date.now()}`, front: { interface: "M48x0.75", gender: "female" }, rear: { interface: "M48x0.75", gender: "male" }, lengthMm }));
  form.set("specSheet", new Blob([sheet.bytes as BlobPart], { type: sheet.type }), sheet.name);
  return form;
}

describe("1 · the dev outbox (account takeover)", () => {
  it("is 404 for visitors and members, and readable by the admin", async () => {
    const member = await signedIn("member@trainyard.test");
    const admin = await signedIn("admin@trainyard.test");
    // The attack: ask for a reset, then read the link from the outbox.
    await new Client().post("/api/auth/request-password-reset", { email: "admin@trainyard.test", redirectTo: "/reset-password" });
    for (const c of [new Client(), member]) {
      const api = await c.get("/api/dev/outbox?to=admin");
      expect(api.status).toBe(404);
      expect(JSON.stringify(await api.json())).not.toContain("reset");
      expect((await c.get("/dev/outbox")).status).toBe(404);
    }
    const own = await admin.get("/api/dev/outbox?to=admin");
    expect(own.status).toBe(200);
    expect(Array.isArray((await own.json()).messages)).toBe(true);
    expect((await admin.get("/dev/outbox")).status).toBe(200);
  });
});

describe("2 · cross-site writes", () => {
  it("refuses a foreign Origin (403) and a non-JSON body (415) with a member's cookie", async () => {
    const member = await signedIn("member@trainyard.test");
    const slug = await saveBuild(member, "private");
    const patch = (headers: Record<string, string>) => fetch(`${BASE_URL}/api/v1/builds/${slug}`, {
      method: "PATCH", headers: { cookie: member.cookieHeader(), ...headers }, body: JSON.stringify({ visibility: "public" }),
    });
    const foreign = await patch({ origin: "https://evil.example", "content-type": "text/plain" });
    expect(foreign.status).toBe(403);
    expect((await foreign.json()).error.code).toBe("forbidden:origin");
    const otherPort = await patch({ origin: `http://127.0.0.1:${Number(new URL(BASE_URL).port) + 1}`, "content-type": "application/json" });
    expect(otherPort.status).toBe(403);
    const crossSite = await patch({ "sec-fetch-site": "cross-site", "content-type": "application/json" });
    expect(crossSite.status).toBe(403);
    const plain = await patch({ origin: BASE_URL, "content-type": "text/plain" });
    expect(plain.status).toBe(415);
    expect((await plain.json()).error.code).toBe("unsupported_media_type");
    // Nothing changed.
    expect((await (await member.get(`/api/v1/builds/${slug}`)).json()).visibility).toBe("private");
    // The site itself still can.
    expect((await member.patch(`/api/v1/builds/${slug}`, { visibility: "unlisted" })).status).toBe(200);
  });

  it("refuses a no-cors style build creation from another origin", async () => {
    const member = await signedIn("member@trainyard.test");
    const res = await fetch(`${BASE_URL}/api/v1/builds`, {
      method: "POST", headers: { cookie: member.cookieHeader(), origin: "http://localhost:1", "content-type": "text/plain;charset=UTF-8" },
      body: JSON.stringify({ title: "planted", visibility: "public", request: flagshipRequest, solutionIndex: 0 }),
    });
    expect(res.status).toBe(403);
  });
});

describe("3 · one request must not stall everyone", () => {
  const [request] = makeRequests(makeCatalog(2_000, "uniform"), 1);

  it("caps inline work: parts, maxParts, maxSolutions and body size", async () => {
    const c = new Client();
    const tooMany = { ...request, parts: makeCatalog(2_001, "uniform") };
    expect((await c.post("/api/v1/solve", tooMany)).status).toBe(413);
    const deep = await c.post("/api/v1/solve", { ...request, maxParts: 13 });
    expect(deep.status).toBe(400);
    expect((await deep.json()).error.fields.maxParts).toBeDefined();
    expect((await c.post("/api/v1/solve", { ...request, maxSolutions: 21 })).status).toBe(400);
    const padded = await c.post("/api/v1/solve", { ...request, pad: "x".repeat(1_100_000) });
    expect(padded.status).toBe(413);
  });

  it("answers health while heavy inline solves run on the worker pool", async () => {
    const c = new Client();
    const order: string[] = [];
    const heavy = [0, 1].map(() => c.post("/api/v1/solve", { ...request, maxParts: 12, maxSolutions: 20 }).then(async (r) => { order.push("solve"); return r; }));
    await new Promise((r) => setTimeout(r, 150)); // the bodies are parsed; the solves are in the workers
    const health = fetch(`${BASE_URL}/api/health`).then((r) => { order.push("health"); return r; });
    const results = await Promise.all(heavy);
    expect((await health).status).toBe(200);
    for (const r of results) expect(r.status).toBe(200);
    expect((await results[0].json()).status).toBeDefined();
    // On one thread, health waited behind both solves.
    expect(order.indexOf("health")).toBeLessThan(order.lastIndexOf("solve"));
  });
});

/** Stream `total` bytes in chunks with no Content-Length; resolve with the status and how much was sent. */
function streamUpload(path: string, headers: Record<string, string>, total: number): Promise<{ status: number; sent: number }> {
  return new Promise((resolve, reject) => {
    const url = new URL(path, BASE_URL);
    let sent = 0;
    let done = false;
    const req = http.request({ host: url.hostname, port: url.port, path: url.pathname, method: "POST", headers: { ...headers, "transfer-encoding": "chunked", origin: BASE_URL } }, (res) => {
      done = true;
      res.resume();
      resolve({ status: res.statusCode ?? 0, sent });
      req.destroy();
    });
    req.on("error", (err) => { if (!done) reject(err); });
    const chunk = Buffer.alloc(256 * 1024, 0x20);
    const pump = () => {
      while (!done && sent < total) {
        sent += chunk.length;
        if (!req.write(chunk)) { req.once("drain", pump); return; }
      }
      if (!done) req.end();
    };
    pump();
  });
}

describe("6 · unbounded bodies", () => {
  it("stops reading a chunked JSON body at the limit (413 long before 300 MB)", async () => {
    const { status, sent } = await streamUpload("/api/v1/solve", { "content-type": "application/json" }, 300_000_000);
    expect(status).toBe(413);
    expect(sent).toBeLessThan(100_000_000);
  });

  it("stops reading a chunked upload at the limit, and answers an over-size sheet with 413", async () => {
    const member = await signedIn("member@trainyard.test");
    const { status, sent } = await streamUpload("/api/v1/submissions", { "content-type": "multipart/form-data; boundary=x", cookie: member.cookieHeader() }, 500_000_000);
    expect(status).toBe(413);
    expect(sent).toBeLessThan(150_000_000);

    const big = new Uint8Array(10.1 * 1024 * 1024);
    big.set(PDF);
    const res = await member.request("/api/v1/submissions", { method: "POST", body: partForm("Big", 5, { bytes: big, type: "application/pdf", name: "big.pdf" }) });
    expect(res.status).toBe(413);
    expect((await res.json()).error.fields.specSheet).toBeDefined();
  });
});

describe("7 · builds with invented parts", () => {
  it("refuses inline parts and inline devices in a saved build", async () => {
    const member = await signedIn("member@trainyard.test");
    const forged = { id: "tarrant-machining-m48-spacer-10-mm", name: "M48 spacer 10 mm", front: { interface: "M48x0.75", gender: "female" }, rear: { interface: "M48x0.75", gender: "male" }, lengthMm: 18.2 };
    const { source: _source, ...withoutSource } = flagshipRequest;
    const res = await member.post("/api/v1/builds", { title: "Forged spacer", visibility: "public", request: { ...withoutSource, parts: [forged] }, solutionIndex: 0 });
    expect(res.status).toBe(400);
    expect((await res.json()).error.fields["request.parts"]).toBeDefined();
    const station = await member.post("/api/v1/builds", { title: "Forged wheel", visibility: "public", request: { ...flagshipRequest, stations: [{ ...forged, id: "nettlebeck-instruments-carousel-7-2in" }] }, solutionIndex: 0 });
    expect(station.status).toBe(400);
    expect((await station.json()).error.fields["request.stations.0"]).toBeDefined();
  });
});

describe("9 · the smaller defects", () => {
  it("never lets X-Forwarded-Host decide links", async () => {
    const member = await signedIn("member@trainyard.test");
    const slug = await saveBuild(member, "public");
    const evil = { "x-forwarded-host": "evil.example", "x-forwarded-proto": "https" };
    const one = await (await fetch(`${BASE_URL}/api/v1/builds/${slug}`, { headers: evil })).json();
    expect(JSON.stringify(one)).not.toContain("evil.example");
    const list = await (await fetch(`${BASE_URL}/api/v1/builds?limit=5`, { headers: evil })).json();
    expect(JSON.stringify(list)).not.toContain("evil.example");
    const page = await (await fetch(`${BASE_URL}/b/${slug}`, { headers: evil })).text();
    expect(page).not.toContain("evil.example");
    expect(page).toContain(`${BASE_URL}/b/${slug}/opengraph-image`);
  });

  it("does not let a moderator approve their own submission", async () => {
    const mod = await signedIn("moderator@trainyard.test");
    const created = await (await mod.request("/api/v1/submissions", { method: "POST", body: partForm("Own", 4) })).json();
    const own = await mod.post(`/api/v1/submissions/${created.id}/review`, { decision: "approve" });
    expect(own.status).toBe(403);
    expect((await fetch(`${BASE_URL}/api/v1/parts/${created.slug}`)).status).toBe(404);
    const admin = await signedIn("admin@trainyard.test");
    expect((await admin.post(`/api/v1/submissions/${created.id}/review`, { decision: "approve" })).status).toBe(200);
  });

  it("pages GET /api/v1/submissions", async () => {
    const member = await signedIn("member@trainyard.test");
    for (let i = 0; i < 3; i++) {
      expect((await member.request("/api/v1/submissions", { method: "POST", body: partForm(`Page ${i}`, 3 + i) })).status).toBe(201);
    }
    const seen: string[] = [];
    let cursor: string | null = null;
    for (let page = 0; page < 3; page++) {
      const body = await (await member.get(`/api/v1/submissions?limit=1${cursor ? `&cursor=${cursor}` : ""}`)).json() as { items: { id: string }[]; nextCursor: string | null };
      expect(body.items).toHaveLength(1);
      seen.push(body.items[0].id);
      cursor = body.nextCursor;
      if (page < 2) expect(cursor).toBeTruthy();
    }
    expect(new Set(seen).size).toBe(3);
    expect((await member.get("/api/v1/submissions?cursor=not*a*cursor")).status).toBe(400);
  });

  it("answers 403 to non-members on the organization update and invite routes", async () => {
    const owner = await signedIn("shop@trainyard.test");
    const orgs = await (await owner.get("/api/auth/organization/list")).json() as { id: string; slug: string }[];
    const shop = orgs.find((o) => o.slug === "lantern-row-optics")!;
    expect(shop).toBeDefined();
    const member = await signedIn("member@trainyard.test");
    const update = await member.post("/api/auth/organization/update", { organizationId: shop.id, data: { name: "Taken over" } });
    expect(update.status).toBe(403);
    const invite = await member.post("/api/auth/organization/invite-member", { organizationId: shop.id, email: "friend@example.org", role: "staff" });
    expect(invite.status).toBe(403);
    const still = await (await owner.get("/api/auth/organization/list")).json() as { slug: string; name: string }[];
    expect(still.find((o) => o.slug === "lantern-row-optics")!.name).toBe("Lantern Row Optics");
  });
});

describe("issue 13 · headers on pages, the API and spec sheets", () => {
  it("sends a nonce CSP without unsafe-eval, and the common headers", async () => {
    const res = await fetch(`${BASE_URL}/plan`);
    const csp = res.headers.get("content-security-policy") ?? "";
    const nonce = /'nonce-([^']+)'/.exec(csp)?.[1];
    expect(nonce).toBeTruthy();
    expect(csp).not.toContain("unsafe-eval");
    expect(csp).toContain("frame-ancestors 'none'");
    const html = await res.text();
    expect(html).toContain(`nonce="${nonce}"`);
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
    // Plain HTTP here: no HSTS (a browser would pin a site that cannot do HTTPS), and a
    // client's own X-Forwarded-Proto does not count (no trusted proxy is configured).
    expect(res.headers.get("strict-transport-security")).toBeNull();
    expect((await fetch(`${BASE_URL}/plan`, { headers: { "x-forwarded-proto": "https" } })).headers.get("strict-transport-security")).toBeNull();
    // A second view gets a different nonce.
    const again = (await fetch(`${BASE_URL}/plan`)).headers.get("content-security-policy") ?? "";
    expect(/'nonce-([^']+)'/.exec(again)?.[1]).not.toBe(nonce);
    const api = await fetch(`${BASE_URL}/api/v1/interfaces`);
    expect(api.headers.get("x-content-type-options")).toBe("nosniff");
    expect(api.headers.get("content-security-policy")).toContain("default-src 'none'");
  });

  it("serves a spec sheet with its sniffed type, a download name and nosniff", async () => {
    const member = await signedIn("member@trainyard.test");
    // Claimed as HTML; the bytes are a PDF.
    const form = partForm("Sheet", 6, { bytes: PDF, type: "text/html", name: "sheet.html" });
    const created = await (await member.request("/api/v1/submissions", { method: "POST", body: form })).json();
    const sheet = await member.get(`/api/v1/submissions/${created.id}/spec-sheet`);
    expect(sheet.headers.get("content-type")).toBe("application/pdf");
    expect(sheet.headers.get("content-disposition")).toMatch(/filename=".+-spec-sheet\.pdf"/);
    expect(sheet.headers.get("x-content-type-options")).toBe("nosniff");
  });
});
