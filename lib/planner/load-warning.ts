// With a separate corrector, say a load warning in the focuser's terms: the corrector's weight
// counts against the telescope's rating too. Rewrites the warnings' text in place. Pure.
import type { Camera, Chain, Part } from "@/lib/solver";
import type { PartRowLike } from "@/lib/catalog/rows";

export function sayLoadWithCorrector({ chains, telescopeRow, correctorRow, weighed }: {
  chains: (Chain | null | undefined)[];
  telescopeRow: PartRowLike | null;
  correctorRow: PartRowLike | null;
  /** Everything a chain's steps can name: the parts drawn from, the devices and the camera. */
  weighed: (Part | Camera)[];
}): void {
  if (!telescopeRow || !correctorRow || telescopeRow.specs.maxLoadG === undefined) return;
  const rating = telescopeRow.specs.maxLoadG;
  const corrG = correctorRow.weightG ?? 0;
  let weightOf: Map<string, number> | undefined; // built only when a load warning needs it
  for (const chain of chains) {
    for (const w of chain?.warnings ?? []) {
      if (w.code !== "load") continue;
      weightOf ??= new Map(weighed.map((p) => [p.id, p.weightG ?? 0]));
      const train = chain!.steps.reduce((sum, st) => sum + (weightOf!.get(st.partId) ?? 0), 0);
      w.message = `With the ${correctorRow.maker} ${correctorRow.model} (${Math.round(corrG)} g), the focuser of the ${telescopeRow.maker} ${telescopeRow.model} carries about ${Math.round(train + corrG)} g, more than the ${Math.round(rating)} g it is rated for.`;
    }
  }
}
