// A ban written straight to the database (not through better-auth's admin endpoint, which
// revokes sessions itself) must still end the banned user's session everywhere: the app's own
// routes, better-auth's get-session, and better-auth's other endpoints.
import { eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import * as schema from "@/db/schema";
import { signedIn, uniqueEmail } from "../support/http";
import { createUser, setBanned, testDb } from "../support/seed-users";

const { db, pool } = testDb();
afterAll(() => pool.end());

async function bannedClient() {
  const email = uniqueEmail("banned-later");
  const userId = await createUser(db, { email, name: "Ora Banned-Later" });
  const client = await signedIn(email);
  const before = (await (await client.get("/api/auth/get-session")).json()) as { user?: { email: string } } | null;
  expect(before?.user?.email).toBe(email);
  await setBanned(db, userId);
  return { client, userId };
}

const sessionsOf = async (userId: string) => (await db.select().from(schema.session).where(eq(schema.session.userId, userId))).length;

describe("a ban set in the database", () => {
  it("makes get-session answer null and deletes the user's sessions", async () => {
    const { client, userId } = await bannedClient();
    expect(await sessionsOf(userId)).toBe(1);
    const res = await client.get("/api/auth/get-session");
    expect(res.status).toBe(200);
    expect(await res.json()).toBeNull();
    expect(await sessionsOf(userId)).toBe(0);
  });

  it("refuses better-auth's other endpoints with the old cookie (401) and ends the session", async () => {
    const { client, userId } = await bannedClient();
    const res = await client.post("/api/auth/update-user", { name: "Renamed While Banned" });
    expect(res.status).toBe(401);
    const [u] = await db.select({ name: schema.user.name }).from(schema.user).where(eq(schema.user.id, userId));
    expect(u?.name).toBe("Ora Banned-Later");
    expect(await sessionsOf(userId)).toBe(0);
  });

  it("refuses the app's own routes (401) before the session is looked at again", async () => {
    const { client } = await bannedClient();
    expect((await client.get("/api/v1/gear")).status).toBe(401);
  });

  it("lets a ban that has expired pass", async () => {
    const email = uniqueEmail("ban-expired");
    const userId = await createUser(db, { email, name: "Ilse Ban-Expired" });
    const client = await signedIn(email);
    await db.update(schema.user).set({ banned: true, banExpires: new Date(Date.now() - 60_000) }).where(eq(schema.user.id, userId));
    const s = (await (await client.get("/api/auth/get-session")).json()) as { user?: { email: string } } | null;
    expect(s?.user?.email).toBe(email);
    expect((await client.get("/api/v1/gear")).status).toBe(200);
  });
});
