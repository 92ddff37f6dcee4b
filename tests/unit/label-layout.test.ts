// The build drawing's callouts never collide: no two labels in a row overlap, no leader passes
// through another label (property test over random trains).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { MIN_LEADER_GAP, layoutCallouts, type Callout } from "@/lib/builds/label-layout";

function collisions(labels: Callout[], placed: ReturnType<typeof layoutCallouts>): string[] {
  const bad: string[] = [];
  placed.forEach((a, i) => {
    if (!(a.left <= labels[i].cx && a.right >= labels[i].cx)) bad.push(`label ${i} is not on its leader`);
    placed.forEach((b, j) => {
      if (i >= j) return;
      if (a.row === b.row && a.left < b.right && b.left < a.right) bad.push(`labels ${i} and ${j} overlap in row ${a.row}`);
    });
    placed.forEach((b, j) => {
      if (i !== j && b.row < a.row && labels[i].cx > b.left && labels[i].cx < b.right) bad.push(`leader ${i} crosses label ${j}`);
    });
  });
  return bad;
}

describe("layoutCallouts", () => {
  it("keeps the seed's crowded case apart: three M48 joints within 130 units and a long optics name", () => {
    const labels = [{ cx: 142, width: 121 }, { cx: 179, width: 121 }, { cx: 272, width: 121 }, { cx: 466, width: 121 }, { cx: 856, width: 121 }];
    const placed = layoutCallouts(labels, 0, 1000);
    expect(collisions(labels, placed)).toEqual([]);
    const names = [{ cx: 101, width: 133 }, { cx: 160, width: 110 }, { cx: 225, width: 110 }, { cx: 369, width: 92 }];
    expect(collisions(names, layoutCallouts(names, 0, 1000))).toEqual([]);
  });

  it("keeps the fallback staircase clear when the drawing's left edge pushes the first label right", () => {
    // Found by the property below: eight labels exhaust the search, and the first label, clamped
    // at the left edge, used to reach over the second leader.
    const raw = [[16, 52.00000000000001], [16, 20], [16, 20], [26.00000000000004, 20], [25.00000000000032, 57.000000000000384], [16, 24.000000000000014], [16, 24.000000000000014], [16, 20]];
    let x = 20;
    const labels = raw.map(([gap, width]) => {
      x += gap;
      return { cx: x, width };
    });
    expect(collisions(labels, layoutCallouts(labels, 0, Infinity))).toEqual([]);
  });

  // The drawing merges joints closer than MIN_LEADER_GAP into one callout, so leaders are at least that far apart.
  it("never collides, for any train of labels", () => {
    fc.assert(fc.property(
      fc.array(fc.record({ gap: fc.double({ min: MIN_LEADER_GAP, max: 300, noNaN: true }), width: fc.double({ min: 20, max: 160, noNaN: true }) }), { minLength: 1, maxLength: 14 }),
      (raw) => {
        let x = 20;
        const labels = raw.map((r) => {
          x += r.gap;
          return { cx: x, width: r.width };
        });
        expect(collisions(labels, layoutCallouts(labels, 0, Infinity))).toEqual([]);
      }), { numRuns: 1000 });
  });
});
