import { customAlphabet } from "nanoid";

// Base-58 style: no 0, O, I or l, so a link read aloud or retyped survives.
export const SLUG_ALPHABET = "123456789ABCDEFGHJKLMNPQRSTUVWXYZabcdefghijkmnopqrstuvwxyz";

/**
 * An unguessable short slug: 8 characters ≈ 47 bits from the system's random source
 * (nanoid reads node:crypto and drops the bytes ≥ 232 = 4 × 58, so every character is equally likely).
 */
export const newBuildSlug: (length?: number) => string = customAlphabet(SLUG_ALPHABET, 8);
