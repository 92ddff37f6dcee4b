import { describe, expect, it } from "vitest";
import { Client, firstLink, signedIn, waitForMail } from "../support/http";
import { newVerifiedUser, put } from "./shops-support";

const LANTERN = "lantern-row-optics";
const KILN = "kilnworth-astro-supply";

describe("shop routes check membership and role", () => {
  it("lets owner and staff read and write their shop, and refuses another shop's owner, a member and a visitor", async () => {
    const [owner, staff, otherOwner, member] = await Promise.all([
      signedIn("shop@trainyard.test"), signedIn("staff@trainyard.test"), signedIn("kilnworth@trainyard.test"), signedIn("member@trainyard.test"),
    ]);
    const visitor = new Client();
    const noChange = { items: [], remove: [] };
    const routes: [string, (c: Client) => Promise<Response>][] = [
      ["GET inventory", (c) => c.get(`/api/v1/shops/${LANTERN}/inventory`)],
      ["PUT inventory", (c) => put(c, `/api/v1/shops/${LANTERN}/inventory`, noChange)],
      ["GET export", (c) => c.get(`/api/v1/shops/${LANTERN}/inventory/export`)],
      ["POST import", (c) => c.request(`/api/v1/shops/${LANTERN}/inventory/import`, { method: "POST", headers: { "content-type": "text/csv" }, body: "catalog_slug,sku,price_cents,currency,on_hand\ntarrant-machining-m48-spacer-5-mm,X-1,100,USD,1\n" })],
      ["GET members", (c) => c.get(`/api/v1/shops/${LANTERN}/members`)],
      ["GET stock-next", (c) => c.get(`/api/v1/shops/${LANTERN}/stock-next`)],
    ];
    for (const [name, call] of routes) {
      expect((await call(owner)).status, `${name} as owner`).toBe(200);
      expect((await call(staff)).status, `${name} as staff`).toBe(200);
      expect((await call(otherOwner)).status, `${name} as another shop's owner`).toBe(403);
      expect((await call(member)).status, `${name} as a member`).toBe(403);
      expect((await call(visitor)).status, `${name} as a visitor`).toBe(401);
    }
    // The same staff member is a stranger to another shop, for everything.
    expect((await staff.get(`/api/v1/shops/${KILN}/inventory`)).status).toBe(403);
    expect((await put(staff, `/api/v1/shops/${KILN}/inventory`, noChange)).status).toBe(403);
    expect((await staff.get(`/api/v1/shops/${KILN}/stock-next`)).status).toBe(403);
    expect((await staff.get("/api/v1/shops/no-such-shop/inventory")).status).toBe(404);
  });

  it("keeps inviting, removing and API keys to the owner", async () => {
    const staff = await signedIn("staff@trainyard.test");
    expect((await staff.post(`/api/v1/shops/${LANTERN}/members`, { email: "someone@example.org" })).status).toBe(403);
    expect((await staff.get(`/api/v1/shops/${LANTERN}/api-keys`)).status).toBe(403);
    expect((await staff.post(`/api/v1/shops/${LANTERN}/api-keys`, { name: "till" })).status).toBe(403);
    const owner = await signedIn("shop@trainyard.test");
    const { members } = await (await owner.get(`/api/v1/shops/${LANTERN}/members`)).json();
    const ownerRow = members.find((m: { role: string }) => m.role === "owner");
    // Staff cannot remove the owner; nobody can.
    expect((await staff.delete(`/api/v1/shops/${LANTERN}/members/${ownerRow.id}`)).status).toBe(403);
    const self = await owner.delete(`/api/v1/shops/${LANTERN}/members/${ownerRow.id}`);
    expect(self.status).toBe(403);
    expect((await self.json()).error.message).toMatch(/owner/i);
  });

  it("answers a bad invitation with 400 and field errors", async () => {
    const owner = await signedIn("shop@trainyard.test");
    const res = await owner.post(`/api/v1/shops/${LANTERN}/members`, { email: "not an address" });
    expect(res.status).toBe(400);
    expect((await res.json()).error.fields.email).toBeDefined();
  });

  it("invites staff by e-mail through the outbox; they accept, work, and lose access when removed", async () => {
    const owner = await signedIn("kilnworth@trainyard.test");
    const invitee = await newVerifiedUser("kiln-staff");
    expect((await invitee.client.get(`/api/v1/shops/${KILN}/inventory`)).status).toBe(403);

    const invite = await owner.post(`/api/v1/shops/${KILN}/members`, { email: invitee.email });
    expect(invite.status).toBe(201);
    const mail = await waitForMail(invitee.email, "Join Kilnworth Astro Supply");
    const id = new URL(firstLink(mail.text)).pathname.split("/").pop()!;

    // Someone else cannot accept it.
    const stranger = await signedIn("member@trainyard.test");
    expect((await stranger.post(`/api/v1/shops/invitations/${id}/accept`)).status).toBe(403);

    expect((await invitee.client.post(`/api/v1/shops/invitations/${id}/accept`)).status).toBe(200);
    expect((await invitee.client.get(`/api/v1/shops/${KILN}/inventory`)).status).toBe(200);
    const { members } = await (await owner.get(`/api/v1/shops/${KILN}/members`)).json();
    const row = members.find((m: { email: string }) => m.email === invitee.email);
    expect(row.role).toBe("staff");

    // Staff cannot remove staff; the owner can.
    expect((await invitee.client.delete(`/api/v1/shops/${KILN}/members/${row.id}`)).status).toBe(403);
    expect((await owner.delete(`/api/v1/shops/${KILN}/members/${row.id}`)).status).toBe(200);
    expect((await invitee.client.get(`/api/v1/shops/${KILN}/inventory`)).status).toBe(403);
  });

  it("shows the user's shops and roles on the account page", async () => {
    const owner = await signedIn("shop@trainyard.test");
    const html = await (await owner.get("/account")).text();
    expect(html).toContain("Lantern Row Optics");
    expect(html).toMatch(/Role: <span[^>]*>owner<\/span>/);
    const staff = await signedIn("staff@trainyard.test");
    expect(await (await staff.get("/account")).text()).toMatch(/Role: <span[^>]*>staff<\/span>/);
  });
});
