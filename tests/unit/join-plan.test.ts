// A plan is `ok` only when every link it solves is: a telescope that cannot join its corrector
// makes the whole plan "no-connection", naming the joint and what would close it.
import { describe, expect, it } from "vitest";
import { joinPlan, neededAdapter } from "@/lib/planner/join-plan";
import { solveTrain, type Part } from "@/lib/solver";

const scope = { id: "scope", name: "Test 102 ED", front: null, rear: { interface: "barrel-2in", gender: "female" as const }, lengthMm: 0 };
const reducer = { id: "reducer", name: "Test M63 Reducer", front: { interface: "M63x1", gender: "male" as const }, rear: null, lengthMm: 0 };
const spacer = (id: string, len: number): Part => ({ id, front: { interface: "M48x0.75", gender: "female" }, rear: { interface: "M48x0.75", gender: "male" }, lengthMm: len });
const adapter: Part = { id: "a-2in-m63", name: "2in to M63 adapter", front: { interface: "barrel-2in", gender: "male" }, rear: { interface: "M63x1", gender: "female" }, lengthMm: 10 };

// Corrector → camera: reaches focus (55 mm = 37.5 + 15 + 2.5).
const rear = solveTrain({
  optics: { id: "reducer", front: null, rear: { interface: "M48x0.75", gender: "male" }, lengthMm: 0, backFocusMm: 55 },
  camera: { id: "cam", front: { interface: "M48x0.75", gender: "female" }, rear: null, lengthMm: 37.5 },
  parts: [spacer("s15", 15), spacer("s2.5", 2.5)],
});

describe("joinPlan", () => {
  it("keeps the rear's answer when the telescope joins the corrector", () => {
    const link = solveTrain({ optics: scope, camera: reducer, parts: [adapter] });
    const plan = joinPlan({ rear, link, telescope: scope, corrector: reducer });
    expect(rear.status).toBe("ok");
    expect(link.status).toBe("ok");
    expect(plan.status).toBe("ok");
    expect(plan.solutions).toEqual(rear.solutions);
    expect(plan.missingJoint).toBeNull();
  });

  it("is no-connection as a whole when the telescope cannot join its corrector, naming the joint", () => {
    const link = solveTrain({ optics: scope, camera: reducer, parts: [spacer("s15", 15)] });
    expect(link.status).toBe("no-connection");
    const plan = joinPlan({ rear, link, catalogLink: link, telescope: scope, corrector: reducer });
    expect(plan.status).toBe("no-connection");
    expect(plan.rearStatus).toBe("ok");
    expect(plan.solutions).toEqual([]); // nothing to offer as alternatives, nothing to save
    expect(plan.shortest).toEqual(rear.solutions[0]); // the train behind the corrector is still drawn
    expect(plan.reason).toContain("Test 102 ED's 2-inch barrel (female) rear");
    expect(plan.reason).toContain("Test M63 Reducer's M63 × 1 (male) front");
    expect(plan.reason).toContain("none in the catalog");
    expect(plan.missingJoint).toMatchObject({ skyId: "scope", sensorId: "reducer", adapterIds: [] });
    expect(plan.reason).toBe(`The telescope does not join the corrector: ${plan.missingJoint!.detail[0].toLowerCase()}${plan.missingJoint!.detail.slice(1)}`);
    expect(plan.missingJoint!.needed).toBe(neededAdapter(scope.rear, reducer.front));
    expect(plan.missingJoint!.needed).toBe("an adapter with a 2-inch barrel (male) front and an M63 × 1 (female) rear");
  });

  it("names the catalog adapters that would join it when the plan's own parts do not", () => {
    const link = solveTrain({ optics: scope, camera: reducer, parts: [] });
    const catalogLink = solveTrain({ optics: scope, camera: reducer, parts: [adapter] });
    const plan = joinPlan({ rear, link, catalogLink, telescope: scope, corrector: reducer, nameOf: (id) => (id === adapter.id ? adapter.name! : id) });
    expect(plan.status).toBe("no-connection");
    expect(plan.missingJoint!.adapterIds).toEqual(["a-2in-m63"]);
    expect(plan.reason).toContain("The catalog has what joins them: 2in to M63 adapter.");
  });
});
