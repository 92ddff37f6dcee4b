import { randomBytes } from "node:crypto";

// Base-58 style: no 0, O, I or l, so a link read aloud or retyped survives.
const ALPHABET = "123456789ABCDEFGHJKLMNPQRSTUVWXYZabcdefghijkmnopqrstuvwxyz";

// Hand-written for now (nanoid's customAlphabet would do the same): rejection sampling over
// node:crypto, so every character is equally likely; swapping it is a follow-up with its own test.
/** An unguessable short slug: 8 characters ≈ 47 bits from the system's random source. */
export function newBuildSlug(length = 8): string {
  let out = "";
  while (out.length < length) {
    for (const byte of randomBytes(length * 2)) {
      // 232 = 4 × 58: drop the top bytes so every character is equally likely.
      if (byte < 232 && out.length < length) out += ALPHABET[byte % 58];
    }
  }
  return out;
}
