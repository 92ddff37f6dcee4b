// Every input limit at exactly the limit (accepted) and one past it (refused).
import { describe, expect, it } from "vitest";
import { MAX_STATIONS, MAX_SOLUTIONS, parsePlanParams } from "@/lib/planner/url-state";
import { listPartsQuerySchema } from "@/lib/validation/catalog";
import { setGearSchema } from "@/lib/validation/gear";
import { createBuildSchema, hideBuildSchema, listBuildsQuerySchema, threadUrlSchema, updateBuildSchema } from "@/lib/validation/builds";

const ok = (schema: { safeParse: (v: unknown) => { success: boolean } }, v: unknown) => schema.safeParse(v).success;
const plan = (q: string) => parsePlanParams(new URLSearchParams(q));
const request = { optics: { partId: "a" }, camera: { partId: "b" } };

describe("build, gear and moderation limits", () => {
  it("title: 120 characters saved, 121 refused", () => {
    expect(ok(createBuildSchema, { title: "t".repeat(120), request })).toBe(true);
    expect(ok(createBuildSchema, { title: "t".repeat(121), request })).toBe(false);
    expect(ok(updateBuildSchema, { title: "t".repeat(120) })).toBe(true);
    expect(ok(updateBuildSchema, { title: "t".repeat(121) })).toBe(false);
  });
  it("notes: 4,000 characters saved, 4,001 refused", () => {
    expect(ok(updateBuildSchema, { notes: "n".repeat(4000) })).toBe(true);
    expect(ok(updateBuildSchema, { notes: "n".repeat(4001) })).toBe(false);
  });
  it("solution index 0..100", () => {
    expect(ok(createBuildSchema, { title: "t", request, solutionIndex: 100 })).toBe(true);
    expect(ok(createBuildSchema, { title: "t", request, solutionIndex: 101 })).toBe(false);
    expect(ok(createBuildSchema, { title: "t", request, solutionIndex: -1 })).toBe(false);
  });
  it("gear quantity: 0..99", () => {
    expect(ok(setGearSchema, { partId: "p", quantity: 99 })).toBe(true);
    expect(ok(setGearSchema, { partId: "p", quantity: 100 })).toBe(false);
    expect(ok(setGearSchema, { partId: "p", quantity: 0 })).toBe(true);
    expect(ok(setGearSchema, { partId: "p", quantity: -1 })).toBe(false);
    expect(ok(setGearSchema, { partId: "p".repeat(160), quantity: 1 })).toBe(true);
    expect(ok(setGearSchema, { partId: "p".repeat(161), quantity: 1 })).toBe(false);
  });
  it("hide reason 3..500, thread address up to 2,000", () => {
    expect(ok(hideBuildSchema, { reason: "r".repeat(500) })).toBe(true);
    expect(ok(hideBuildSchema, { reason: "r".repeat(501) })).toBe(false);
    expect(ok(hideBuildSchema, { reason: "rr" })).toBe(false);
    const url = (n: number) => `https://forum.example/${"x".repeat(n - 22)}`;
    expect(url(2000).length).toBe(2000);
    expect(ok(threadUrlSchema, { url: url(2000) })).toBe(true);
    expect(ok(threadUrlSchema, { url: url(2001) })).toBe(false);
  });
});

describe("list query limits", () => {
  it("parts: limit 1..200, q up to 100", () => {
    expect(ok(listPartsQuerySchema, { limit: "200" })).toBe(true);
    expect(ok(listPartsQuerySchema, { limit: "201" })).toBe(false);
    expect(ok(listPartsQuerySchema, { limit: "0" })).toBe(false);
    expect(ok(listPartsQuerySchema, { q: "q".repeat(100) })).toBe(true);
    expect(ok(listPartsQuerySchema, { q: "q".repeat(101) })).toBe(false);
  });
  it("builds: limit 1..100, q up to 100", () => {
    expect(ok(listBuildsQuerySchema, { limit: "100" })).toBe(true);
    expect(ok(listBuildsQuerySchema, { limit: "101" })).toBe(false);
    expect(ok(listBuildsQuerySchema, { q: "q".repeat(100) })).toBe(true);
    expect(ok(listBuildsQuerySchema, { q: "q".repeat(101) })).toBe(false);
  });
  it("refuses NUL characters and cursors that are not ours", () => {
    expect(ok(listPartsQuerySchema, { q: "a\u0000b" })).toBe(false);
    expect(ok(listPartsQuerySchema, { cursor: "AA" })).toBe(false);
    expect(ok(listBuildsQuerySchema, { cursor: "MSwxLHg" })).toBe(false);
    expect(ok(listBuildsQuerySchema, { cursor: Buffer.from(`1,2026-01-02T03:04:05.123456Z,${crypto.randomUUID()}`).toString("base64url") })).toBe(true);
  });
});

describe("planner URL ranges: each maximum is inclusive, one past is dropped", () => {
  it("filter thickness (0, 10] mm", () => {
    expect(plan("filter=10").filter?.thicknessMm).toBe(10);
    expect(plan("filter=10.001").filter).toBeNull();
    expect(plan("filter=0").filter).toBeNull();
    expect(plan("filter=0.001").filter?.thicknessMm).toBe(0.001);
  });
  it("refractive index [1, 2.5]", () => {
    expect(plan("filter=2&n=2.5").filter?.refractiveIndex).toBe(2.5);
    expect(plan("filter=2&n=2.501").filter?.refractiveIndex).toBe(1.5);
    expect(plan("filter=2&n=1").filter?.refractiveIndex).toBe(1);
    expect(plan("glass=10&gn=2.5").extraGlass).toEqual({ thicknessMm: 10, refractiveIndex: 2.5 });
  });
  it("tolerance [0.01, 10] mm", () => {
    expect(plan("tol=10").toleranceMm).toBe(10);
    expect(plan("tol=10.01").toleranceMm).toBeNull();
    expect(plan("tol=0.01").toleranceMm).toBe(0.01);
    expect(plan("tol=0.009").toleranceMm).toBeNull();
  });
  it(`alternative 1..${MAX_SOLUTIONS}, stations up to ${MAX_STATIONS}, slugs up to 140 characters`, () => {
    expect(plan(`alt=${MAX_SOLUTIONS}`).alt).toBe(MAX_SOLUTIONS - 1);
    expect(plan(`alt=${MAX_SOLUTIONS + 1}`).alt).toBe(0);
    const s = (n: number) => Array.from({ length: n }, (_, i) => `wheel-${i}`).join(",");
    expect(plan(`stations=${s(MAX_STATIONS)}`).stations).toHaveLength(MAX_STATIONS);
    expect(plan(`stations=${s(MAX_STATIONS + 1)}`).stations).toHaveLength(MAX_STATIONS);
    expect(plan(`camera=${"c".repeat(140)}`).camera).toBe("c".repeat(140));
    expect(plan(`camera=${"c".repeat(141)}`).camera).toBeNull();
  });
});
