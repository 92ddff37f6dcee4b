// Display helpers (lib/format.ts) that several pages share.
import { describe, expect, it } from "vitest";
import { formatDay, listAnd } from "@/lib/format";

describe("formatDay", () => {
  it("writes the UTC day, whatever the machine's time zone", () => {
    expect(formatDay(new Date("2026-12-05T23:30:00Z"))).toBe("5 Dec 2026");
    expect(formatDay(new Date("2026-12-06T00:30:00+02:00"))).toBe("5 Dec 2026");
  });

  it("takes the ISO strings JSON brings and shows a dash for no date", () => {
    expect(formatDay("2027-01-31T12:00:00.000Z")).toBe("31 Jan 2027");
    expect(formatDay(null)).toBe("—");
    expect(formatDay(undefined)).toBe("—");
  });
});

describe("listAnd", () => {
  it("joins with commas and a last “and” (no comma before it)", () => {
    expect(listAnd(["A"])).toBe("A");
    expect(listAnd(["A", "B", "C"])).toBe("A, B and C");
  });
});
