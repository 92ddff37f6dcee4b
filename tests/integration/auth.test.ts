import { describe, expect, it } from "vitest";
import { BASE_URL, Client, firstLink, signedIn, uniqueEmail, waitForMail } from "../support/http";

describe("health", () => {
  it("answers ok with the database up", async () => {
    const res = await fetch(`${BASE_URL}/api/health`);
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ ok: true, db: "up" });
  });
});

describe("sign-up, verification and sign-in", () => {
  it("sends a verification e-mail whose link verifies and lets the user sign in", async () => {
    const email = uniqueEmail("newcomer");
    const c = new Client();
    const signUp = await c.post("/api/auth/sign-up/email", { name: "New Comer", email, password: "correct horse 42" });
    expect(signUp.status).toBe(200);

    // Not verified yet: sign-in is refused.
    const early = await new Client().post("/api/auth/sign-in/email", { email, password: "correct horse 42" });
    expect(early.status).toBe(403);

    const mail = await waitForMail(email, "Confirm your e-mail");
    const link = firstLink(mail.text);
    expect(link).toContain("/api/auth/verify-email");

    const verifier = new Client();
    const verified = await verifier.request(new URL(link).pathname + new URL(link).search);
    expect([200, 302, 307]).toContain(verified.status);

    const s = await new Client().signIn(email, "correct horse 42");
    const session = await s.get("/api/auth/get-session");
    const body = await session.json();
    expect(body.user.email).toBe(email);
    expect(body.user.emailVerified).toBe(true);
    expect(body.user.role).toBe("member");
  });

  it("refuses a wrong password with 401 and no session", async () => {
    const res = await new Client().post("/api/auth/sign-in/email", { email: "member@trainyard.test", password: "not-the-password" });
    expect(res.status).toBe(401);
    expect(res.headers.getSetCookie().some((c) => c.includes("session_token=") && !/max-age=0/i.test(c))).toBe(false);
  });

  it("sends a reset link that changes the password", async () => {
    const email = uniqueEmail("forgetful");
    const c = new Client();
    await c.post("/api/auth/sign-up/email", { name: "Forgetful", email, password: "first password 1" });
    await waitForMail(email, "Confirm your e-mail");
    const ask = await c.post("/api/auth/request-password-reset", { email, redirectTo: "/reset-password" });
    expect(ask.status).toBe(200);
    const mail = await waitForMail(email, "Reset your Trainyard password");
    const link = new URL(firstLink(mail.text));
    const follow = await new Client().request(link.pathname + link.search);
    const location = new URL(follow.headers.get("location") ?? "", BASE_URL);
    const token = location.searchParams.get("token");
    expect(token).toBeTruthy();
    const reset = await new Client().post("/api/auth/reset-password", { newPassword: "second password 2", token });
    expect(reset.status).toBe(200);
  });

  it("accepts both 127.0.0.1 and localhost origins and refuses a foreign one", async () => {
    const port = new URL(BASE_URL).port;
    for (const origin of [`http://127.0.0.1:${port}`, `http://localhost:${port}`]) {
      const res = await fetch(`${BASE_URL}/api/auth/sign-in/email`, {
        method: "POST", headers: { "content-type": "application/json", origin },
        body: JSON.stringify({ email: "member@trainyard.test", password: process.env.DEMO_PASSWORD ?? "trainyard-demo" }),
      });
      expect(res.status, origin).toBe(200);
    }
    const foreign = await fetch(`${BASE_URL}/api/auth/sign-in/email`, {
      method: "POST", headers: { "content-type": "application/json", origin: "http://evil.example", cookie: "x=1" },
      body: JSON.stringify({ email: "member@trainyard.test", password: process.env.DEMO_PASSWORD ?? "trainyard-demo" }),
    });
    expect(foreign.status).toBe(403);
  });
});

describe("roles", () => {
  it("gives a member 403 on an admin-only handler, the admin 200, and a visitor 401", async () => {
    const member = await signedIn("member@trainyard.test");
    const res = await member.get("/api/v1/admin/users");
    expect(res.status).toBe(403);
    expect((await res.json()).error.code).toBe("forbidden");

    const admin = await signedIn("admin@trainyard.test");
    const ok = await admin.get("/api/v1/admin/users");
    expect(ok.status).toBe(200);
    const { items } = await ok.json();
    expect(items.map((u: { email: string }) => u.email)).toContain("moderator@trainyard.test");

    expect((await new Client().get("/api/v1/admin/users")).status).toBe(401);
  });

  it("signs out", async () => {
    const member = await signedIn("member@trainyard.test");
    expect((await member.post("/api/auth/sign-out", {})).status).toBe(200);
    const session = await member.get("/api/auth/get-session");
    expect(await session.json()).toBeNull();
  });
});
