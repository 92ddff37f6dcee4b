import { describe, expect, it } from "vitest";

describe("GET /api/health", () => {
  it("answers 503 with db down when the database cannot be reached", async () => {
    // Port 1 on loopback refuses connections at once.
    process.env.DATABASE_URL = "postgres://nobody@127.0.0.1:1/none";
    const { GET } = await import("@/app/api/health/route");
    const res = await GET();
    expect(res.status).toBe(503);
    expect(await res.json()).toEqual({ ok: false, db: "down" });
  });
});
