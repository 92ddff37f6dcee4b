// The last step of a plan: describe every part the answer names — in its chains, the nearest
// chain, the remedies, the telescope link and the adapters a missing joint needs — so the
// client draws and lists them without asking again. Owned copies keep their `~owned` id.
import type { PartRow } from "@/db/schema";
import { rowToPlanItem } from "@/lib/catalog/to-solver";
import type { Chain, SolveResult } from "@/lib/solver";
import type { PlanItem } from "./api-types";
import type { JoinedPlan } from "./join-plan";
import type { Remedy } from "./what-to-change";

function addChainIds(result: SolveResult | null, into: Set<string>) {
  if (!result) return;
  const variants = result.solutions.flatMap((c) => c.variants ?? []);
  for (const chain of [result.shortest, ...result.solutions, ...variants]) for (const s of chain?.steps ?? []) into.add(s.partId);
}

export function addUsedItems({ items, rows, joined, nearest, remedies, telescopeLink }: {
  items: Record<string, PlanItem>;
  /** The catalog's rows by slug. */
  rows: Map<string, PartRow>;
  joined: JoinedPlan;
  nearest: Chain | null;
  remedies: Remedy[];
  telescopeLink: SolveResult | null;
}): void {
  const used = new Set<string>();
  addChainIds(joined, used);
  for (const s of nearest?.steps ?? []) used.add(s.partId);
  for (const r of remedies) for (const c of r.changes) used.add(c.id);
  addChainIds(telescopeLink, used);
  for (const id of joined.missingJoint?.adapterIds ?? []) used.add(id);
  for (const id of used) {
    if (items[id]) continue;
    const row = rows.get(id.replace(/~owned$/, ""));
    if (row) items[id] = rowToPlanItem(row, { owned: id.endsWith("~owned") });
  }
}
