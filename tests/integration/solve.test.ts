import { describe, expect, it } from "vitest";
import { DEMO_CASES } from "@/seed/catalog";
import { BASE_URL, Client, signedIn } from "../support/http";

const flagship = DEMO_CASES.flagship;
const BK7 = 1.5168; // N-BK7 at 587.6 nm — SCHOTT data as listed on refractiveindex.info

function flagshipBody(extra: Record<string, unknown> = {}) {
  return {
    ...(flagship.telescope ? { optics: { partId: flagship.telescope }, corrector: { partId: flagship.optics } } : { optics: { partId: flagship.optics } }),
    camera: { partId: flagship.camera },
    stations: flagship.stations.map((s) => ({ partId: s })),
    filters: [{ thicknessMm: 2, refractiveIndex: BK7 }],
    source: { kind: "catalog" },
    ...extra,
  };
}

async function solve(body: unknown, client = new Client()) {
  const res = await client.post("/api/v1/solve", body);
  return { status: res.status, body: await res.json() };
}

describe("POST /api/v1/solve with catalog references", () => {
  it("finds chains for the demo corrector, wheel and camera that land in the window", async () => {
    const { status, body } = await solve(flagshipBody());
    expect(status).toBe(200);
    expect(body.status).toBe("ok");
    // 2 mm of N-BK7 adds 2·(n−1)/n = 0.681 mm (W. J. Smith, Modern Optical Engineering, §7.8).
    expect(body.filterShiftMm).toBeCloseTo(0.681, 3);
    expect(body.targetMm).toBeCloseTo(55.681, 3);
    expect(body.solutions.length).toBeGreaterThan(0);
    for (const chain of body.solutions) {
      expect(Math.abs(chain.sensorDistanceMm - body.targetMm)).toBeLessThanOrEqual(body.toleranceMm + 1e-6);
      expect(chain.steps.at(-1).partId).toBe(flagship.camera);
      expect(chain.steps.map((s: { partId: string }) => s.partId)).toContain(flagship.stations[0]);
    }
    // Every step is described for drawing.
    for (const step of body.solutions[0].steps) expect(body.context.items[step.partId]).toBeDefined();
    expect(body.context.plateScaleArcsecPerPx).toBeGreaterThan(0);
  });

  it("uses the tolerance override", async () => {
    const tight = await solve(flagshipBody({ backFocusToleranceMm: 0.05 }));
    expect(tight.status).toBe(200);
    expect(tight.body.toleranceMm).toBe(0.05);
    for (const chain of tight.body.solutions) expect(Math.abs(chain.errorMm)).toBeLessThanOrEqual(0.05 + 1e-6);
  });

  it("says why a too-long train cannot work", async () => {
    const c = DEMO_CASES.tooLong;
    const { body } = await solve({ optics: { partId: c.optics }, camera: { partId: c.camera }, stations: c.stations.map((s) => ({ partId: s })), filters: [{ thicknessMm: c.filterThicknessMm }], source: { kind: "catalog" } });
    expect(body.status).toBe("too-long");
    expect(body.reason).toMatch(/mm/);
    expect(body.solutions).toEqual([]);
  });

  it("answers malformed input with 400 and field errors", async () => {
    const bad = await solve({ optics: { partId: "" }, camera: 7, filters: [{ thicknessMm: -1 }] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toBeDefined();
    expect(Object.keys(bad.body.error.fields).some((k) => k.startsWith("camera"))).toBe(true);
    const notJson = await new Client().request("/api/v1/solve", { method: "POST", body: "{oops", headers: { "content-type": "application/json" } });
    expect(notJson.status).toBe(400);
  });

  it("answers 404 for an unknown part and 400 for a camera used as optics", async () => {
    expect((await solve(flagshipBody({ optics: { partId: "no-such-scope" } }))).status).toBe(404);
    const wrong = await solve(flagshipBody({ optics: { partId: flagship.camera } }));
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields["optics.partId"]).toBeDefined();
  });

  it("answers 404 for a shop that does not exist", async () => {
    const res = await solve(flagshipBody({ source: { kind: "shop", shop: "no-such-shop" } }));
    expect(res.status).toBe(404);
    expect(res.body.error.message).toMatch(/no-such-shop/);
  });

  it("refuses absurd sizes", async () => {
    const part = { id: "x", front: { interface: "M48x0.75", gender: "female" }, rear: { interface: "M48x0.75", gender: "male" }, lengthMm: 1 };
    const many = Array.from({ length: 20_001 }, (_, i) => ({ ...part, id: `p${i}` }));
    const res = await solve({ optics: { id: "o", front: null, rear: { interface: "M48x0.75", gender: "male" }, lengthMm: 0 }, camera: { id: "c", front: { interface: "M48x0.75", gender: "female" }, rear: null, lengthMm: 17.5 }, parts: many });
    expect([400, 413]).toContain(res.status);
  });

  it("solves an inline request exactly as the contract says", async () => {
    const spacer = (id: string, len: number) => ({ id, front: { interface: "M42x0.75", gender: "female" }, rear: { interface: "M42x0.75", gender: "male" }, lengthMm: len, priceCents: 1000 });
    const { status, body } = await solve({
      optics: { id: "corr", front: null, rear: { interface: "M42x0.75", gender: "male" }, lengthMm: 0, backFocusMm: 55 },
      camera: { id: "cam", front: { interface: "M42x0.75", gender: "female" }, rear: null, lengthMm: 17.5 },
      parts: [spacer("s20", 20), spacer("s15", 15), spacer("s5", 5), spacer("s2", 2.5)],
    });
    expect(status).toBe(200);
    expect(body.status).toBe("ok");
    // The camera takes 17.5 mm, so the spacers must add 37.5 ± 0.5: no pair does (the nearest
    // are 35 and 40), and 20 + 15 + 2.5 is the one three-spacer answer that hits it exactly.
    const best = body.solutions[0];
    expect(best.partCount).toBe(3);
    expect(best.steps.filter((s: { role: string }) => s.role === "connector").map((s: { partId: string }) => s.partId).sort()).toEqual(["s15", "s2", "s20"]);
    expect(best.sensorDistanceMm).toBeCloseTo(55, 6);
    expect(best.errorMm).toBeCloseTo(0, 6);
    expect(best.priceCents).toBe(3000);
    expect(body.context).toBeUndefined();
  });
});

describe("planning with owned gear", () => {
  it("needs a session, and then counts owned parts as free", async () => {
    const signedOut = await solve(flagshipBody({ source: { kind: "owned" } }));
    expect(signedOut.status).toBe(401);

    const member = await signedIn("member@trainyard.test");
    type Owned = { part: { slug: string }; quantity: number };
    const gearNow = async () => new Map(((await (await member.get("/api/v1/gear")).json()).items as Owned[]).map((i) => [i.part.slug, i.quantity]));
    const before = await gearNow();
    const first = await solve(flagshipBody(), member);
    const bought: string[] = first.body.solutions[0].steps.filter((s: { role: string }) => s.role === "connector").map((s: { partId: string }) => s.partId);
    for (const slug of bought) {
      const res = await member.request("/api/v1/gear", { method: "PUT", json: { partId: slug, quantity: (before.get(slug) ?? 0) + 1 } });
      expect(res.status).toBe(200);
    }
    try {
      const owned = await solve(flagshipBody({ source: { kind: "owned" } }), member);
      expect(owned.status).toBe(200);
      const best = owned.body.solutions[0];
      // Same parts count and error as the catalog's best, but free: owned copies win the price tie.
      expect(best.partCount).toBe(first.body.solutions[0].partCount);
      expect(best.priceCents).toBe(0);
      expect(best.steps.filter((s: { role: string }) => s.role === "connector").every((s: { partId: string }) => s.partId.endsWith("~owned"))).toBe(true);
      expect(owned.body.context.items[best.steps[0].partId].owned).toBe(true);
      const after = await gearNow();
      for (const slug of bought) expect(after.get(slug)).toBe((before.get(slug) ?? 0) + 1);
    } finally {
      for (const slug of bought) await member.request("/api/v1/gear", { method: "PUT", json: { partId: slug, quantity: before.get(slug) ?? 0 } });
    }
    expect(await gearNow()).toEqual(before);
  });

  it("answers a bad gear change with field errors", async () => {
    const member = await signedIn("member@trainyard.test");
    const res = await member.request("/api/v1/gear", { method: "PUT", json: { partId: "", quantity: -4 } });
    expect(res.status).toBe(400);
    const { error } = await res.json();
    expect(error.fields.partId).toBeDefined();
    expect(error.fields.quantity).toBeDefined();
    expect((await fetch(`${BASE_URL}/api/v1/gear`)).status).toBe(401);
  });
});
