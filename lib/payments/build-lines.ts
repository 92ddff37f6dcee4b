// The parts a buyer still has to buy for a saved build: the chosen chain's connecting parts,
// less what this buyer owns (the build may be someone else's reference build).
import { chosenTelescopeLink, itemOf, stripOwned } from "@/lib/builds/chain";
import type { PlanResponse } from "@/lib/planner/api-types";
import type { Chain } from "@/lib/solver/types";

export type NeededPart = { slug: string; name: string; count: number };

export function partsToBuy(result: PlanResponse, chain: Chain, owned: Map<string, number>): NeededPart[] {
  const counts = new Map<string, NeededPart>();
  const connectorIds = [
    ...(chosenTelescopeLink(result)?.steps ?? []).filter((s) => s.role === "connector").map((s) => s.partId),
    ...chain.steps.filter((s) => s.role === "connector").map((s) => s.partId),
  ];
  for (const id of connectorIds) {
    const item = itemOf(result, id);
    const slug = stripOwned(item.slug);
    const line = counts.get(slug) ?? { slug, name: item.name, count: 0 };
    line.count += 1;
    counts.set(slug, line);
  }
  const left: NeededPart[] = [];
  for (const line of counts.values()) {
    const count = line.count - (owned.get(line.slug) ?? 0);
    if (count > 0) left.push({ ...line, count });
  }
  return left;
}

/** Sky to sensor, named: what the quote page shows as "the train". */
export function trainNames(result: PlanResponse, chain: Chain): { name: string; role: string }[] {
  const ctx = result.context;
  const out: { name: string; role: string }[] = [];
  if (ctx.telescopeId) out.push({ name: itemOf(result, ctx.telescopeId).name, role: "telescope" });
  for (const s of chosenTelescopeLink(result)?.steps ?? []) if (s.role === "connector") out.push({ name: itemOf(result, s.partId).name, role: "connector" });
  out.push({ name: itemOf(result, ctx.opticsId).name, role: "optics" });
  for (const s of chain.steps) out.push({ name: itemOf(result, s.partId).name, role: s.role });
  return out;
}
