// Fixed-size bitsets on Uint32Array words; bit i = 1 << (i & 31) of word i >> 5. Shifts move
// bits towards higher indices and drop whatever passes the end.

export type Bits = Uint32Array;

/** dst |= src << shift. Safe when dst === src (walks from the top down). */
export function orShift(dst: Bits, src: Bits, shift: number): void {
  const n = dst.length;
  const ws = shift >>> 5, bs = shift & 31;
  if (ws >= n) return;
  if (bs === 0) {
    for (let i = n - 1; i >= ws; i--) dst[i] |= src[i - ws];
    return;
  }
  const back = 32 - bs;
  for (let i = n - 1; i > ws; i--) dst[i] |= (src[i - ws] << bs) | (src[i - ws - 1] >>> back);
  dst[ws] |= src[0] << bs;
}

/** dst |= src << s for every s in [shift, shift + width], using tmp as scratch. */
export function orShiftRange(dst: Bits, src: Bits, shift: number, width: number, tmp: Bits): void {
  if (width <= 0) { orShift(dst, src, shift); return; }
  tmp.fill(0);
  orShift(tmp, src, shift);
  let covered = 1; // tmp holds shifts [shift, shift + covered - 1]
  while (covered <= width) {
    const step = Math.min(covered, width + 1 - covered);
    orShift(tmp, tmp, step);
    covered += step;
  }
  for (let i = 0; i < dst.length; i++) dst[i] |= tmp[i];
}

export function setRange(bits: Bits, from: number, to: number): void {
  const last = Math.min(to, bits.length * 32 - 1);
  for (let b = Math.max(0, from); b <= last; b++) bits[b >>> 5] |= 1 << (b & 31);
}

export function popcount(bits: Bits): number {
  let c = 0;
  for (let i = 0; i < bits.length; i++) {
    let v = bits[i];
    v = v - ((v >>> 1) & 0x55555555);
    v = (v & 0x33333333) + ((v >>> 2) & 0x33333333);
    c += (((v + (v >>> 4)) & 0x0f0f0f0f) * 0x01010101) >>> 24;
  }
  return c;
}

export function isEmpty(bits: Bits): boolean {
  for (let i = 0; i < bits.length; i++) if (bits[i] !== 0) return false;
  return true;
}

export function forEachBit(bits: Bits, visit: (bit: number) => void): void {
  for (let i = 0; i < bits.length; i++) {
    let v = bits[i];
    while (v !== 0) {
      const low = v & -v;
      visit((i << 5) + 31 - Math.clz32(low));
      v ^= low;
    }
  }
}

/** Lowest set bit in [from, to], or -1. */
export function firstSetIn(bits: Bits, from: number, to: number): number {
  const top = Math.min(to, bits.length * 32 - 1);
  if (from < 0) from = 0;
  if (from > top) return -1;
  let i = from >>> 5;
  let v = bits[i] & (~0 << (from & 31));
  const lastWord = top >>> 5;
  for (;;) {
    if (v !== 0) {
      const b = (i << 5) + 31 - Math.clz32(v & -v);
      return b <= top ? b : -1;
    }
    if (++i > lastWord) return -1;
    v = bits[i];
  }
}

/** Highest set bit in [from, to], or -1. */
export function lastSetIn(bits: Bits, from: number, to: number): number {
  if (from < 0) from = 0;
  const top = Math.min(to, bits.length * 32 - 1);
  if (from > top) return -1;
  let i = top >>> 5;
  const sh = 31 - (top & 31);
  let v = sh === 0 ? bits[i] : (bits[i] << sh) >>> sh;
  for (;;) {
    if (v !== 0) {
      const b = (i << 5) + 31 - Math.clz32(v);
      return b >= from ? b : -1;
    }
    if (--i < from >>> 5) return -1;
    v = bits[i];
  }
}

/** Clear every bit above `top` (all of them when top < 0). */
export function clearAbove(bits: Bits, top: number): void {
  if (top < 0) { bits.fill(0); return; }
  const w = top >>> 5;
  if (w >= bits.length) return;
  const keep = top & 31;
  if (keep < 31) bits[w] &= (1 << (keep + 1)) - 1;
  bits.fill(0, w + 1);
}

/** dst |= src. */
export function orInto(dst: Bits, src: Bits): void {
  for (let i = 0; i < dst.length; i++) dst[i] |= src[i];
}
