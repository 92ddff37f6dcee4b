// Alternatives an imager would call different: two chains whose connecting parts are the same
// ports and lengths part for part (the same 3 mm + 15 mm pair from another maker) are one
// geometry. The plan lists distinct geometries, each with up to 3 variants: the same train from
// other makers (SOLVER.md, contract v2 §3, applied in the plan layer over the solver's ranking).
import type { Chain, Part } from "@/lib/solver";

export type PlanChain = Chain & { variants?: Chain[] };

type Shape = Pick<Part, "front" | "rear" | "lengthMm" | "adjustMm">;

const portKey = (p: Part["front"]) => (p ? `${p.interface}/${p.gender}` : "-");
export const partGeometry = (p: Shape) => `${portKey(p.front)}>${portKey(p.rear)}@${p.lengthMm}+${p.adjustMm ?? 0}`;

export function chainGeometry(chain: Chain, shapeOf: (id: string) => Shape | undefined): string {
  const keys: string[] = [];
  for (const s of chain.steps) {
    if (s.role !== "connector") continue;
    const shape = shapeOf(s.partId);
    keys.push(shape ? partGeometry(shape) : `?${s.partId}`);
  }
  return keys.sort().join("|");
}

/** Keep the first `max` geometries in rank order; the later multisets of each become its variants (≤ 3). */
export function groupByGeometry(solutions: Chain[], shapeOf: (id: string) => Shape | undefined, max: number): PlanChain[] {
  const out: PlanChain[] = [];
  const byKey = new Map<string, PlanChain>();
  for (const chain of solutions) {
    const key = chainGeometry(chain, shapeOf);
    const head = byKey.get(key);
    if (head) {
      if (head.variants!.length < 3) head.variants!.push(chain);
      continue;
    }
    if (out.length >= max) continue;
    const planChain: PlanChain = { ...chain, variants: [] };
    byKey.set(key, planChain);
    out.push(planChain);
  }
  return out;
}
