import { describe, expect, it } from "vitest";
import { countDetours, type Step } from "@/lib/solver";

const step = (iface: string, role: Step["role"] = "connector"): Step => ({ partId: `${iface}-${role}`, role, reversed: false, lengthMm: 1, startMm: 0, joint: { interface: iface } });

describe("detours (contract v2 §1.3)", () => {
  it("counts M48 → M63 → M48 as one, within a leg only", () => {
    expect(countDetours([step("M48"), step("M63"), step("M48", "camera")])).toBe(1);
    expect(countDetours([step("M48"), step("M48"), step("M48", "camera")])).toBe(0);
    expect(countDetours([step("M48"), step("2in"), step("M54"), step("M48", "camera")])).toBe(1);
    expect(countDetours([step("M48"), step("M63"), step("M48"), step("M63"), step("M48", "camera")])).toBe(3);
    // The station ends the leg: M48 after it is a new leg, not a return.
    expect(countDetours([step("M48"), step("M63", "station"), step("M48"), step("M48", "camera")])).toBe(0);
  });
});
