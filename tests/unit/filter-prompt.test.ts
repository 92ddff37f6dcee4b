import { describe, expect, it } from "vitest";
import type { PlanItem, PlanResponse } from "@/lib/planner/api-types";
import { uncountedFilters } from "@/lib/planner/filter-prompt";

const item = (id: string, kind: string, filterThicknessMm?: number): PlanItem => ({
  id, slug: id, name: `Test ${id}`, maker: "Test", model: id, kind, front: null, rear: null, lengthMm: 20, adjustMm: null,
  clearApertureMm: null, weightG: null, priceCents: null, owned: false, ...(filterThicknessMm ? { filterThicknessMm } : {}),
});
const plan = (items: PlanItem[]) => ({ context: { stationIds: items.map((i) => i.id), items: Object.fromEntries(items.map((i) => [i.id, i])) } }) as unknown as Pick<PlanResponse, "context">;

describe("uncountedFilters", () => {
  it("asks about the glass a wheel's spec says it holds when the plan counts none", () => {
    expect(uncountedFilters(plan([item("oag", "oag"), item("wheel", "filter-wheel", 2)]), false)).toEqual({ stationId: "wheel", name: "Test wheel", thicknessMm: 2 });
    expect(uncountedFilters(plan([item("drawer", "filter-drawer", 3)]), false)?.thicknessMm).toBe(3);
  });
  it("stays quiet once glass is declared, or when the holder's spec says nothing", () => {
    expect(uncountedFilters(plan([item("wheel", "filter-wheel", 2)]), true)).toBeNull();
    expect(uncountedFilters(plan([item("wheel", "filter-wheel")]), false)).toBeNull();
  });
});
