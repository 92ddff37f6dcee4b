// The bitset helpers behind the length relaxation, against plain boolean arrays.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { clearAbove, firstSetIn, forEachBit, isEmpty, lastSetIn, orInto, orShift, orShiftRange, popcount, setRange } from "@/lib/solver/bitset";

const WORDS = 5;
const N = WORDS * 32;
const bitsArb = fc.array(fc.boolean(), { minLength: N, maxLength: N });

const toBits = (bools: boolean[]) => {
  const b = new Uint32Array(WORDS);
  bools.forEach((v, i) => { if (v) b[i >>> 5] |= 1 << (i & 31); });
  return b;
};
const toBools = (b: Uint32Array) => Array.from({ length: N }, (_, i) => (b[i >>> 5] & (1 << (i & 31))) !== 0);

describe("bitset", () => {
  it("orShift and orShiftRange add shifted copies and drop what passes the end", () => {
    fc.assert(fc.property(bitsArb, bitsArb, fc.integer({ min: 0, max: N + 40 }), fc.integer({ min: 0, max: 70 }), (a, b, shift, width) => {
      const want = [...a];
      for (let s = shift; s <= shift + width; s++) b.forEach((v, i) => { if (v && i + s < N) want[i + s] = true; });
      const dst = toBits(a);
      orShiftRange(dst, toBits(b), shift, width, new Uint32Array(WORDS));
      expect(toBools(dst)).toEqual(want);
      const one = toBits(a);
      orShift(one, toBits(b), shift);
      const wantOne = [...a];
      b.forEach((v, i) => { if (v && i + shift < N) wantOne[i + shift] = true; });
      expect(toBools(one)).toEqual(wantOne);
    }));
  });

  it("orShift in place shifts the original, not its own output", () => {
    fc.assert(fc.property(bitsArb, fc.integer({ min: 1, max: 100 }), (a, shift) => {
      const bits = toBits(a);
      orShift(bits, bits, shift);
      const want = [...a];
      a.forEach((v, i) => { if (v && i + shift < N) want[i + shift] = true; });
      expect(toBools(bits)).toEqual(want);
    }));
  });

  it("finds the first and last set bit in a range, counts and lists bits", () => {
    fc.assert(fc.property(bitsArb, fc.integer({ min: -5, max: N + 5 }), fc.integer({ min: -5, max: N + 5 }), (a, x, y) => {
      const bits = toBits(a);
      const idx = a.flatMap((v, i) => (v ? [i] : []));
      const inRange = idx.filter((i) => i >= x && i <= y);
      expect(firstSetIn(bits, x, y)).toBe(inRange[0] ?? -1);
      expect(lastSetIn(bits, x, y)).toBe(inRange.at(-1) ?? -1);
      expect(popcount(bits)).toBe(idx.length);
      expect(isEmpty(bits)).toBe(idx.length === 0);
      const seen: number[] = [];
      forEachBit(bits, (b) => seen.push(b));
      expect(seen).toEqual(idx);
    }));
  });

  it("clearAbove keeps exactly the bits up to top, and orInto adds one set to another", () => {
    fc.assert(fc.property(bitsArb, bitsArb, fc.integer({ min: -3, max: N + 40 }), (a, b, top) => {
      const bits = toBits(a);
      clearAbove(bits, top);
      expect(toBools(bits)).toEqual(a.map((v, i) => v && i <= top));
      const dst = toBits(a);
      orInto(dst, toBits(b));
      expect(toBools(dst)).toEqual(a.map((v, i) => v || b[i]));
    }));
  });

  it("setRange clips at the end", () => {
    const b = new Uint32Array(2);
    setRange(b, 60, 100);
    expect(toBools(new Uint32Array([...b, 0, 0, 0])).flatMap((v, i) => (v ? [i] : []))).toEqual([60, 61, 62, 63]);
  });
});
