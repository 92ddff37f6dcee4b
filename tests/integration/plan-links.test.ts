// A plan is judged by every link it solves; "what to change" and the corrector picker through the API.
import { describe, expect, it } from "vitest";
import { Client, signedIn } from "../support/http";

const SCOPE_102 = "corvane-optical-meridian-102-ed";
const M63_REDUCER = "corvane-optical-plano-0-75-m63-reducer";
const CAMERA = "quillfield-imaging-cinder-26m-cooled";

async function solve(body: unknown, client = new Client()) {
  const res = await client.post("/api/v1/solve", body);
  return { status: res.status, body: await res.json() };
}

const missingJointPlan = {
  optics: { partId: SCOPE_102 }, corrector: { partId: M63_REDUCER }, camera: { partId: CAMERA }, source: { kind: "catalog" },
};

describe("a telescope that cannot join its corrector", () => {
  it("makes the whole plan no-connection, naming the joint and the adapter it needs", async () => {
    const { status, body } = await solve(missingJointPlan);
    expect(status).toBe(200);
    expect(body.telescopeLink.status).toBe("no-connection");
    expect(body.status).toBe("no-connection");
    expect(body.rearStatus).toBe("ok"); // behind the corrector the train would reach focus
    expect(body.solutions).toEqual([]);
    expect(body.reason).toContain("2-inch barrel (female) rear does not mate with");
    expect(body.reason).toContain("M63 × 1 (male) front");
    expect(body.reason).toContain("none in the catalog");
    expect(body.missingJoint).toMatchObject({ skyId: SCOPE_102, sensorId: M63_REDUCER, adapterIds: [] });
  });

  it("cannot be saved as a build", async () => {
    const member = await signedIn("member@trainyard.test");
    const res = await member.post("/api/v1/builds", { title: "Missing joint", notes: "", visibility: "unlisted", request: missingJointPlan, solutionIndex: 0 });
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error.message).toContain("does not join the corrector");
  });

  it("the Lintel R-0.79 now screws onto the f/7 triplet's M68 focuser", async () => {
    const { body } = await solve({ optics: { partId: "corvane-optical-meridian-115-triplet" }, corrector: { partId: "ashdown-glassworks-lintel-r-0-79-reducer" }, camera: { partId: CAMERA }, source: { kind: "catalog" } });
    expect(body.telescopeLink.status).toBe("ok");
    expect(body.telescopeLink.solutions[0].partCount).toBe(0);
    expect(body.status).toBe("ok");
  });
});

describe("GET /api/v1/parts/:slug/correctors", () => {
  it("marks which correctors join the telescope", async () => {
    const res = await new Client().get(`/api/v1/parts/${SCOPE_102}/correctors`);
    expect(res.status).toBe(200);
    const { correctors } = await res.json() as { correctors: { slug: string; joins: boolean; adapters: number }[] };
    const by = new Map(correctors.map((c) => [c.slug, c]));
    expect(by.get("corvane-optical-plano-1-0-flattener")).toMatchObject({ joins: true, adapters: 0 });
    expect(by.get(M63_REDUCER)).toMatchObject({ joins: false });
  });

  it("answers 400 for a part that is not a telescope", async () => {
    const res = await new Client().get(`/api/v1/parts/${CAMERA}/correctors`);
    expect(res.status).toBe(400);
  });
});

describe("what to change", () => {
  it("finds that removing both the guider and the wheel lands a DSLR body on the astrograph", async () => {
    const { body } = await solve({
      optics: { partId: "ashdown-glassworks-pennant-61" },
      stations: [{ partId: "nettlebeck-instruments-sidelook-10-5-oag" }, { partId: "nettlebeck-instruments-carousel-7-2in" }],
      camera: { partId: "sorrel-camera-co-larch-24-f-bayonet" }, source: { kind: "catalog" },
    });
    expect(body.status).toBe("too-long");
    const sets = (body.remedies as { changes: { kind: string; id: string }[] }[]).map((r) => r.changes.map((c) => `${c.kind}:${c.id}`));
    expect(sets).toContainEqual(["remove-station:nettlebeck-instruments-sidelook-10-5-oag", "remove-station:nettlebeck-instruments-carousel-7-2in"]);
    // Everything suggested is a catalog item the answer describes; an astrograph's corrector is never swapped.
    for (const s of sets.flat()) expect(body.context.items[s.split(":")[1]]).toBeDefined();
    expect(sets.flat().some((s) => s.startsWith("replace-corrector"))).toBe(false);
  });
});
