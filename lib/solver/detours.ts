// Detours (SOLVER.md, contract v2 §1.3): within each leg — the joints from one fixed item's
// rear (optics or station) to the next fixed item's front — a joint whose interface differs
// from the one just before it and equals an earlier joint's in the same leg (M48 → M63 → M48
// is one). A step-up/step-down pair used as a spacer is not what an expert builds.

import type { Step } from "./types";

export function countDetours(steps: readonly Pick<Step, "role" | "joint">[]): number {
  let detours = 0;
  let seen: string[] = [];
  for (const step of steps) {
    const code = step.joint.interface;
    const prev = seen[seen.length - 1];
    if (prev !== undefined && code !== prev && seen.includes(code)) detours++;
    seen.push(code);
    if (step.role !== "connector") seen = []; // a fixed item ends the leg; its rear starts the next
  }
  return detours;
}
