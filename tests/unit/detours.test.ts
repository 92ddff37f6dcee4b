import { describe, expect, it } from "vitest";
import { byPartsThenDetours, countDetours } from "@/lib/planner/detours";
import type { Chain, Step } from "@/lib/solver";

const step = (iface: string, role: Step["role"] = "connector"): Step => ({ partId: `${iface}-${role}`, role, reversed: false, lengthMm: 1, startMm: 0, joint: { interface: iface } });
const chain = (steps: Step[], partCount = steps.filter((s) => s.role === "connector").length): Chain =>
  ({ steps, partCount, sensorDistanceMm: 0, errorMm: 0, priceCents: 0, warnings: [] });

describe("detours (contract v2 §1.3)", () => {
  it("counts M48 → M63 → M48 as one, within a leg only", () => {
    expect(countDetours(chain([step("M48"), step("M63"), step("M48", "camera")]))).toBe(1);
    expect(countDetours(chain([step("M48"), step("M48"), step("M48", "camera")]))).toBe(0);
    expect(countDetours(chain([step("M48"), step("2in"), step("M54"), step("M48", "camera")]))).toBe(1);
    // The station ends the leg: M48 after it is a new leg, not a return.
    expect(countDetours(chain([step("M48"), step("M63", "station"), step("M48"), step("M48", "camera")]))).toBe(0);
  });
  it("ranks a plain three-spacer chain before a three-part detour", () => {
    const detour = chain([step("M48"), step("2in"), step("M54"), step("M48", "camera")]);
    const plain = chain([step("M48"), step("M48"), step("M48"), step("M48", "camera")]);
    expect(byPartsThenDetours([detour, plain])).toEqual([plain, detour]);
  });
});
