// Build slugs (lib/builds/slug.ts, nanoid's customAlphabet): the alphabet and length the saved
// links already use, every one accepted by the slug check, every character equally likely.
import { describe, expect, it } from "vitest";
import { newBuildSlug, SLUG_ALPHABET } from "@/lib/builds/slug";
import { buildSlugSchema } from "@/lib/validation/builds";

describe("newBuildSlug", () => {
  it("keeps the base-58 alphabet of existing links: no 0, O, I or l", () => {
    expect(SLUG_ALPHABET).toHaveLength(58);
    expect(new Set(SLUG_ALPHABET).size).toBe(58);
    for (const c of "0OIl") expect(SLUG_ALPHABET).not.toContain(c);
    // Every character the slug check accepts is in the alphabet, and only those.
    const accepted = [..."0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz"].filter((c) => buildSlugSchema.safeParse(c.repeat(8)).success);
    expect(accepted.join("")).toBe(SLUG_ALPHABET);
  });

  it("is 8 characters (≈ 47 bits) from that alphabet, accepted by the slug check, and never repeats in 20 000 draws", () => {
    const seen = new Set<string>();
    for (let i = 0; i < 20_000; i++) {
      const slug = newBuildSlug();
      expect(slug).toMatch(/^[1-9A-HJ-NP-Za-km-z]{8}$/);
      seen.add(slug);
    }
    expect(buildSlugSchema.safeParse(newBuildSlug()).success).toBe(true);
    expect(seen.size).toBe(20_000);
    expect(8 * Math.log2(58)).toBeGreaterThan(46.8);
  });

  it("takes another length when asked", () => {
    expect(newBuildSlug(12)).toMatch(/^[1-9A-HJ-NP-Za-km-z]{12}$/);
  });

  it("draws every character about equally often (chi-square over 232 000 characters)", () => {
    const counts = new Map<string, number>([...SLUG_ALPHABET].map((c) => [c, 0]));
    for (let i = 0; i < 29_000; i++) for (const c of newBuildSlug()) counts.set(c, (counts.get(c) ?? 0) + 1);
    const expected = (29_000 * 8) / 58;
    const chi2 = [...counts.values()].reduce((s, n) => s + (n - expected) ** 2 / expected, 0);
    // 57 degrees of freedom: the 99.99th percentile is about 106 (Wilson–Hilferty approximation, from memory);
    // a modulo bias (bytes 232–255 kept) would add far more at this sample size.
    expect(chi2).toBeLessThan(108);
  });
});
