// Detours (SOLVER.md, contract v2 §1.3): within each leg — the joints from one fixed item's
// rear (optics or station) to the next fixed item's front — a joint whose interface differs
// from the one just before it and equals an earlier joint's in the same leg (M48 → M63 → M48
// is one). The plan layer ranks its alternatives by them; a step-up/step-down pair used as a
// spacer is not what an expert builds.
import type { Chain } from "@/lib/solver";

export function countDetours(chain: Pick<Chain, "steps">): number {
  let detours = 0;
  let seen: string[] = [];
  for (const step of chain.steps) {
    const code = step.joint.interface;
    const prev = seen[seen.length - 1];
    if (prev !== undefined && code !== prev && seen.includes(code)) detours++;
    seen.push(code);
    if (step.role !== "connector") seen = []; // a fixed item ends the leg; its rear starts the next
  }
  return detours;
}

/** Stable: fewer connecting parts first, then fewer detours; the solver's order otherwise. */
export function byPartsThenDetours<T extends Chain>(chains: T[]): T[] {
  const d = new Map(chains.map((c) => [c, countDetours(c)]));
  return chains.map((c, i) => ({ c, i })).sort((a, b) => a.c.partCount - b.c.partCount || d.get(a.c)! - d.get(b.c)! || a.i - b.i).map((x) => x.c);
}
