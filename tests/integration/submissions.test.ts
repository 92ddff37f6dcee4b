import { describe, expect, it } from "vitest";
import { BASE_URL, Client, signedIn, waitForMail } from "../support/http";

// A minimal valid PDF header is enough for the content check (the file's first bytes).
const PDF = new TextEncoder().encode("%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n");
const PNG = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52, 0, 0, 0, 1, 0, 0, 0, 1, 8, 6, 0, 0, 0, 0x1f, 0x15, 0xc4, 0x89]);

function partBody(model: string) {
  return {
    kind: "spacer", maker: "Test Bench Works", model, front: { interface: "M48x0.75", gender: "female" },
    rear: { interface: "M48x0.75", gender: "male" }, lengthMm: 12.25, clearApertureMm: 44, weightG: 30,
  };
}

async function submit(client: Client, part: unknown, file: { bytes: Uint8Array; name: string; type: string } | null) {
  const form = new FormData();
  form.set("part", JSON.stringify(part));
  if (file) form.set("specSheet", new Blob([file.bytes as BlobPart], { type: file.type }), file.name);
  return client.request("/api/v1/submissions", { method: "POST", body: form });
}

describe("part submissions", () => {
  it("takes a member's part with a PDF spec sheet, which a moderator approves into the catalog", async () => {
    const member = await signedIn("member@trainyard.test");
    const model = `Spacer 12.25 ${Date.now()}`;
    const res = await submit(member, partBody(model), { bytes: PDF, name: "sheet.pdf", type: "application/pdf" });
    expect(res.status).toBe(201);
    const created = await res.json();
    expect(created.status).toBe("pending");

    // Not in the public catalog yet.
    expect((await fetch(`${BASE_URL}/api/v1/parts/${created.slug}`)).status).toBe(404);

    const mod = await signedIn("moderator@trainyard.test");
    const queue = await (await mod.get("/api/v1/submissions")).json();
    expect(queue.items.map((i: { slug: string }) => i.slug)).toContain(created.slug);

    // The spec sheet came back from the S3 store byte for byte.
    const sheet = await mod.get(`/api/v1/submissions/${created.id}/spec-sheet`);
    expect(sheet.headers.get("content-type")).toBe("application/pdf");
    expect(new Uint8Array(await sheet.arrayBuffer())).toEqual(PDF);

    // A member cannot approve.
    expect((await member.post(`/api/v1/submissions/${created.id}/review`, { decision: "approve" })).status).toBe(403);

    const ok = await mod.post(`/api/v1/submissions/${created.id}/review`, { decision: "approve" });
    expect(ok.status).toBe(200);
    const live = await fetch(`${BASE_URL}/api/v1/parts/${created.slug}`);
    expect(live.status).toBe(200);
    expect((await live.json()).lengthMm).toBe(12.25);
    const mail = await waitForMail("member@trainyard.test", model);
    expect(mail.subject).toContain("in the catalog");

    // Reviewing twice is a conflict, not a silent change.
    expect((await mod.post(`/api/v1/submissions/${created.id}/review`, { decision: "reject", reason: "again" })).status).toBe(409);
  });

  it("rejects with a reason, mails the submitter, and flags a probable duplicate", async () => {
    const member = await signedIn("member@trainyard.test");
    const model = `Dup ${Date.now()}`;
    const first = await (await submit(member, partBody(model), { bytes: PNG, name: "a.png", type: "image/png" })).json();
    const second = await (await submit(member, partBody(model), { bytes: PNG, name: "b.png", type: "image/png" })).json();
    expect(second.probableDuplicateOf).toBe(first.slug);

    const mod = await signedIn("moderator@trainyard.test");
    const noReason = await mod.post(`/api/v1/submissions/${second.id}/review`, { decision: "reject" });
    expect(noReason.status).toBe(400);
    expect((await noReason.json()).error.fields.reason).toBeDefined();
    const rejected = await mod.post(`/api/v1/submissions/${second.id}/review`, { decision: "reject", reason: "Same part as the one already submitted." });
    expect(rejected.status).toBe(200);
    const mail = await waitForMail("member@trainyard.test", `not added: Test Bench Works ${model}`);
    expect(mail.text).toContain("Same part as the one already submitted.");
  });

  it("checks the spec sheet by content, not by name", async () => {
    const member = await signedIn("member@trainyard.test");
    const fake = new TextEncoder().encode("MZ this is not a pdf at all");
    const res = await submit(member, partBody(`Fake ${Date.now()}`), { bytes: fake, name: "sheet.pdf", type: "application/pdf" });
    expect(res.status).toBe(400);
    expect((await res.json()).error.fields.specSheet[0]).toMatch(/PDF, PNG or JPEG/);
    const missing = await submit(member, partBody(`None ${Date.now()}`), null);
    expect(missing.status).toBe(400);
  });

  it("answers bad part numbers with field errors", async () => {
    const member = await signedIn("member@trainyard.test");
    const res = await submit(member, { ...partBody("Bad"), lengthMm: -1, front: { interface: "M99x9", gender: "male" } }, { bytes: PDF, name: "s.pdf", type: "application/pdf" });
    expect(res.status).toBe(400);
    const { error } = await res.json();
    expect(error.fields.lengthMm).toBeDefined();
    expect(error.fields["front.interface"]).toBeDefined();
  });

  it("refuses a signed-out submission", async () => {
    const res = await submit(new Client(), partBody("Anon"), { bytes: PDF, name: "s.pdf", type: "application/pdf" });
    expect(res.status).toBe(401);
  });
});
