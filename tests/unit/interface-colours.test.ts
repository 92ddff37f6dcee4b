import { describe, expect, it } from "vitest";
import { INTERFACES, LOOK_ALIKES, interfaceHue, interfaceLabel } from "@/lib/interfaces";

const distance = (a: number, b: number) => Math.min(Math.abs(a - b), 360 - Math.abs(a - b));

describe("interface colours and labels", () => {
  it("gives every interface its own hue, none in the reds and ambers kept for warnings", () => {
    const hues = INTERFACES.map((i) => interfaceHue(i.code));
    expect(new Set(hues).size).toBe(INTERFACES.length);
    for (const h of hues) expect(h >= 55 && h <= 330, `hue ${h}`).toBe(true);
  });

  it("puts look-alikes that do not mate far apart (M42×0.75 vs M42×1; 2-inch barrel, M48, SCT 2\"-24)", () => {
    for (const group of LOOK_ALIKES) {
      for (const a of group) for (const b of group) {
        if (a !== b) expect(distance(interfaceHue(a), interfaceHue(b)), `${a} vs ${b}`).toBeGreaterThanOrEqual(40);
      }
    }
  });

  it("names interfaces the way people write them", () => {
    expect(interfaceLabel("2in-24tpi")).toBe("SCT 2\"-24");
    expect(interfaceLabel("3.25in-24tpi")).toBe("SCT 3.25\"-24");
    expect(interfaceLabel("barrel-2in")).toBe("2-inch barrel");
    expect(interfaceLabel("M48x0.75")).toBe("M48x0.75");
  });
});
