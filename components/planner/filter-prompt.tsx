"use client";
// "This wheel holds 2 mm filters: count their glass?" — one click sets the filter in the beam.
import type { PlanResponse } from "@/lib/planner/api-types";
import { uncountedFilters } from "@/lib/planner/filter-prompt";
import type { Glass } from "@/lib/planner/url-state";
import { MATERIALS } from "./beam-options";

export function FilterPromptNote({ result, glass, onCount }: { result: PlanResponse; glass: Glass | null; onCount: (g: Glass) => void }) {
  const prompt = uncountedFilters(result, glass !== null);
  if (!prompt) return null;
  const kind = result.context.items[prompt.stationId]?.kind === "filter-drawer" ? "drawer" : "wheel";
  return (
    <div role="note" data-testid="filter-prompt" className="flex flex-wrap items-center justify-between gap-2 rounded-lg border border-brass/60 bg-brass/10 px-4 py-2.5 text-sm text-text">
      <p>The {prompt.name} {kind === "wheel" ? "wheel" : "drawer"} holds <span className="num">{prompt.thicknessMm} mm</span> filters, and no glass is counted yet: count their glass?</p>
      <button type="button" onClick={() => onCount({ thicknessMm: prompt.thicknessMm, refractiveIndex: MATERIALS[0].n })}
        className="rounded-md border border-brass bg-surface px-3 py-1.5 text-sm font-medium text-ink hover:bg-brass/15">
        Count {prompt.thicknessMm} mm of glass
      </button>
    </div>
  );
}
