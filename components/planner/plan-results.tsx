"use client";
// The right column: verdict, diagram, budget strip, steps, warnings, alternatives, parts and cautions.
import { useMemo, type ReactNode } from "react";
import type { PlanResponse } from "@/lib/planner/api-types";
import type { PlanState, SolveApiRequest } from "@/lib/planner/url-state";
import { SafetyNote } from "@/components/safety-note";
import { Alternatives } from "./alternatives";
import { BudgetStrip } from "./budget-strip";
import { FilterPromptNote } from "./filter-prompt";
import { NoSolution } from "./no-solution";
import { PartsList, shoppingLines } from "./parts-list";
import { WhereToBuyPanel } from "@/components/shops/where-to-buy-panel";
import { ChainWarnings, OpticsFacts } from "./plan-facts";
import { StepsTable } from "./steps-table";
import { TrainDiagram } from "./train-diagram";
import { buildTrain, itemName, shownChain } from "./train-model";
import { Verdict } from "./verdict";

export type RenderActions = (args: { request: object; solutionIndex: number; result: PlanResponse }) => ReactNode;

function Section({ title, aside, children, id }: { title: string; aside?: ReactNode; children: ReactNode; id: string }) {
  return (
    <section aria-labelledby={id} className="rounded-lg border border-line bg-surface p-4 sm:p-5">
      <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={id} className="text-base font-semibold text-ink">{title}</h2>
        {aside ? <div className="text-xs text-muted">{aside}</div> : null}
      </div>
      {children}
    </section>
  );
}

export function PlanResults({ result, state, update, request, renderActions }: {
  result: PlanResponse; state: PlanState; update: (p: Partial<PlanState>) => void;
  request: SolveApiRequest; renderActions?: RenderActions;
}) {
  const { chain, index, isSolution } = shownChain(result, state.alt);
  const train = useMemo(() => buildTrain(result, chain), [result, chain]);
  const names = (id: string) => itemName(result, id);
  const unit = state.unit;
  const load = chain?.warnings.find((w) => w.code === "load");
  const warnedParts = useMemo(() => {
    const out: Record<string, string> = {};
    for (const w of chain?.warnings ?? []) if (w.partId) out[w.partId] = out[w.partId] ? `${out[w.partId]} ${w.message}` : w.message;
    return out;
  }, [chain]);
  const diagramLabel = `The train from sky to sensor: ${train.items.map((i) => i.name).join(", then ")}`;

  return (
    <div className="space-y-4">
      <Verdict result={result} chain={chain} index={index} unit={unit} onUnit={(u) => update({ unit: u })} />
      <FilterPromptNote result={result} glass={state.filter ?? state.extraGlass} onCount={(g) => update({ filter: g })} />
      {load ? (
        <div role="alert" className="rounded-lg border-2 border-bad/60 bg-bad/5 p-4 text-sm">
          <p className="font-semibold text-bad">▲ Heavier than the focuser is rated for</p>
          <p className="mt-1 text-text">{load.message}</p>
          <div className="mt-2"><SafetyNote /></div>
        </div>
      ) : null}
      {result.status !== "ok" ? <NoSolution result={result} unit={unit} onApply={(patch) => update({
        stations: state.stations.filter((_, j) => !patch.removeStations.includes(j)),
        ...(patch.camera ? { camera: patch.camera } : {}), ...(patch.corrector ? { corrector: patch.corrector } : {}),
      })} /> : null}
      {renderActions && isSolution ? <div className="flex flex-wrap gap-2">{renderActions({ request, solutionIndex: index, result })}</div> : null}

      <Section id="plan-diagram" title="The train" aside={isSolution ? null : result.missingJoint ? "Missing a joint between the telescope and the corrector" : result.nearestChain ? "The nearest reachable chain — it misses the window" : chain ? "The shortest connection — it misses the window" : "Not connected"}>
        <TrainDiagram train={train} unit={unit} label={diagramLabel} warnings={warnedParts} />
      </Section>

      {chain ? (
        <Section id="plan-budget" title="Back focus budget" aside={result.targetMm === null ? "no back focus set by these optics" : `${result.solutions.length ? "chosen chain" : result.nearestChain ? "nearest reachable chain" : "shortest chain"}, to scale`}>
          <BudgetStrip chain={chain} names={names} targetMm={result.targetMm} toleranceMm={result.toleranceMm}
            filterShiftMm={result.filterShiftMm} nearest={result.status === "ok" ? null : result.nearest} unit={unit} />
        </Section>
      ) : null}

      <Section id="plan-steps" title="Step by step" aside={unit === "in" ? "inches, to 0.001" : "millimetres, to 0.1"}>
        <StepsTable train={train} result={result} unit={unit} />
      </Section>

      <Section id="plan-checks" title="Checks and numbers">
        <div className="space-y-3">
          {result.missingJoint ? (
            <p role="alert" className="rounded-md border border-bad/50 bg-bad/5 px-3 py-2 text-sm text-text">
              <span className="font-semibold text-bad">▲ Missing joint · telescope → corrector</span><br />{result.missingJoint.detail}
            </p>
          ) : null}
          <ChainWarnings chain={chain} names={names} />
          <OpticsFacts result={result} chain={chain} />
        </div>
      </Section>

      {result.solutions.length > 1 || result.solutions[0]?.variants?.length ? (
        <Section id="plan-alts" title="Alternatives" aside={`${result.solutions.length} that land in the window, best first`}>
          <Alternatives solutions={result.solutions} chosen={index} onChoose={(alt) => update({ alt })} names={names} unit={unit} currency={result.context.shop?.currency} />
        </Section>
      ) : null}

      {chain ? (
        <Section id="plan-parts" title="Parts" aside={result.missingJoint ? "incomplete: a joint is missing" : result.context.shop ? `${result.context.shop.name}'s prices` : result.context.source === "owned" ? "your parts count as free" : "list prices"}>
          <PartsList train={train} unit={unit} owned={result.context.source === "owned"} currency={result.context.shop?.currency} missing={result.missingJoint ?? null} names={names} />
        </Section>
      ) : null}

      {chain ? <WhereToBuyPanel lines={shoppingLines(train).filter((l) => !l.owned)} /> : null}

      {load ? null : <SafetyNote />}
    </div>
  );
}
