// PostgreSQL text cannot hold U+0000: a NUL in any string (or key) is refused as bad input
// before it reaches a query, instead of failing there as a 500.
import type { z } from "zod";

export const NUL_MESSAGE = "Contains a NUL character (U+0000)";
export const hasNul = (s: string) => s.includes("\u0000");

/** A query-string or body string without NUL characters. */
export const noNul = (s: z.ZodString) => s.refine((v) => !hasNul(v), NUL_MESSAGE);

/**
 * The dotted path of the first string or key holding a NUL, or null. Iterative, so a deeply
 * nested body cannot overflow the stack.
 */
export function findNul(value: unknown): string | null {
  type Node = { v: unknown; key: string; up: Node | null };
  const pathOf = (n: Node | null): string => {
    const keys: string[] = [];
    for (let at = n; at?.up; at = at.up) keys.push(at.key);
    return keys.reverse().join(".") || "_root";
  };
  const stack: Node[] = [{ v: value, key: "", up: null }];
  while (stack.length) {
    const node = stack.pop()!;
    const v = node.v;
    if (typeof v === "string") {
      if (hasNul(v)) return pathOf(node);
    } else if (v && typeof v === "object") {
      for (const k of Object.keys(v)) {
        const child: Node = { v: (v as Record<string, unknown>)[k], key: k, up: node };
        if (hasNul(k)) return pathOf(child);
        stack.push(child);
      }
    }
  }
  return null;
}
