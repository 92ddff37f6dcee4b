"use client";
// The planner: choices on the left (sky to sensor), the answer on the right. The state lives
// in the URL, so a link reproduces the plan; the page solves on load and on every change.
import Link from "next/link";
import { useCallback, useEffect, useState } from "react";
import {
  planStateToParams, planStateToSolveRequest, sameQuestion, type PlanState,
} from "@/lib/planner/url-state";
import { Button } from "@/components/ui/button";
import { listAnd } from "@/lib/format";
import type { PlanResponse } from "@/lib/planner/api-types";
import { ApiError } from "@/components/api-client";
import { usePart } from "./api";
import { BeamOptions } from "./beam-options";
import { PlanResults, type RenderActions } from "./plan-results";
import { TrainChoices } from "./train-choices";
import { useSolve } from "./use-solve";

export type PlannerProps = {
  initial: PlanState;
  signedIn: boolean;
  /** A slot above the diagram for actions on the chosen solution (e.g. "Save as link"). */
  renderActions?: RenderActions;
  /** A planner link to offer while nothing is chosen (the page passes the seed's example plan). */
  exampleHref?: string;
};

function EmptyState({ state, exampleHref }: { state: PlanState; exampleHref?: string }) {
  const missing = listAnd([state.optics ? null : "optics", state.camera ? null : "a camera"].filter((s) => s !== null));
  return (
    <div className="rounded-lg border border-dashed border-line bg-surface p-6 sm:p-8">
      <p className="text-[11px] font-medium uppercase tracking-[0.2em] text-brass-ink">Nothing to solve yet</p>
      <h2 className="mt-2 text-xl font-semibold text-ink">Choose {missing} to find a chain</h2>
      <p className="mt-2 max-w-xl text-muted">
        Trainyard finds the adapters and spacers that mate every joint — same thread, opposite gender — and puts the
        sensor at the corrector&apos;s back focus, counting the path that filter glass adds.
      </p>
      <ol className="mt-4 grid gap-2 text-sm text-text sm:grid-cols-3">
        {["Pick the optics at the sky end", "Add the devices that must be in the train", "Pick the camera at the sensor end"].map((t, i) => (
          <li key={t} className="rounded-md border border-line bg-bg px-3 py-2"><span className="num mr-1.5 font-semibold text-brass-ink">{i + 1}</span>{t}</li>
        ))}
      </ol>
      {exampleHref ? <p className="mt-4 text-sm"><Link href={exampleHref} className="font-medium text-ink underline decoration-brass underline-offset-4">Or open an example: an 80 mm refractor with a flattener, a 2-inch wheel and a cooled camera</Link></p> : null}
    </div>
  );
}

function SolveError({ error, retry }: { error: Error; retry: () => void }) {
  const api = error instanceof ApiError ? error : null;
  const fields = api?.fields ? Object.entries(api.fields) : [];
  const title = api?.status === 404 ? "A chosen part is not in the catalog"
    : api?.status === 400 ? "The planner could not ask that question"
      : api?.status === 401 ? "Sign in to use your own parts" : "The planner could not answer";
  return (
    <div role="alert" className="rounded-lg border border-bad/50 bg-bad/5 p-4 text-sm">
      <p className="font-semibold text-bad">{title}</p>
      <p className="mt-1 text-text">{error.message}</p>
      {fields.length ? <ul className="mt-2 list-disc pl-5 text-text">{fields.map(([k, v]) => <li key={k}><span className="code text-muted">{k}</span>: {v.join("; ")}</li>)}</ul> : null}
      {api?.status === 400 || api?.status === 404 ? null : <Button variant="secondary" className="mt-3" onClick={retry}>Try again</Button>}
    </div>
  );
}

/** On a phone the answer sits below the choices: say it in one line at the top, with a way down. */
function JumpToAnswer({ result, alt }: { result: PlanResponse; alt: number }) {
  const chain = result.solutions[Math.min(alt, Math.max(0, result.solutions.length - 1))] ?? null;
  const ok = result.status === "ok";
  const text = ok && chain ? `Reaches focus: sensor at ${chain.sensorDistanceMm.toFixed(2)} mm` : ok ? "Connected" : "No chain lands in the window";
  return (
    <a href="#plan-answer" className={`flex items-center justify-between rounded-md border px-3 py-2 text-sm font-medium lg:hidden ${ok ? "border-ok/50 bg-ok/10 text-ok" : "border-bad/50 bg-bad/10 text-bad"}`}>
      <span className="num">{text}</span><span aria-hidden>See the plan ↓</span>
    </a>
  );
}

export function Planner({ initial, signedIn, renderActions, exampleHref }: PlannerProps) {
  const [state, setState] = useState<PlanState>(initial);
  const update = useCallback((patch: Partial<PlanState>) => setState((s) => {
    const next = { ...s, ...patch };
    if (!("alt" in patch) && !sameQuestion(s, next)) next.alt = 0;
    return next;
  }), []);

  const query = planStateToParams(state).toString();
  // Not nuqs: the plan is one state with keys that depend on each other (corrector needs optics, shop needs source), read by one
  // pure codec the server page and unit tests share; nuqs adds 5.8 KB gzip to the planner's first-load JS (measured), already near its 250 KB budget.
  useEffect(() => {
    const url = `${window.location.pathname}${query ? `?${query}` : ""}`;
    if (url !== `${window.location.pathname}${window.location.search}`) window.history.replaceState(window.history.state, "", url);
  }, [query]);

  const ownedBlocked = state.source === "owned" && !signedIn;
  const request = planStateToSolveRequest(ownedBlocked ? { ...state, source: "catalog" } : !signedIn && state.shopOwned ? { ...state, shopOwned: false } : state);
  const solve = useSolve(request);
  const correctorOrOptics = usePart(state.corrector ?? state.optics);
  const tol = (correctorOrOptics.data as { backFocusToleranceMm?: number } | undefined)?.backFocusToleranceMm ?? null;
  const signInHref = `/sign-in?next=${encodeURIComponent(`/plan${query ? `?${query}` : ""}`)}`;

  return (
    <div className="grid items-start gap-6 lg:grid-cols-[360px_minmax(0,1fr)]">
      <div className="space-y-4">
        {solve.data && request ? <JumpToAnswer result={solve.data} alt={state.alt} /> : null}
        <TrainChoices state={state} update={update} />
        <BeamOptions state={state} update={update} signedIn={signedIn} signInHref={signInHref} opticsTolerance={tol} />
      </div>
      <div id="plan-answer" className="relative min-w-0 scroll-mt-4" aria-busy={solve.working}>
        <div aria-hidden className={`absolute -top-2 left-0 right-0 h-0.5 overflow-hidden rounded ${solve.working ? "opacity-100" : "opacity-0"} transition-opacity`}>
          <div className="h-full w-1/3 animate-[ty-slide_1.1s_ease-in-out_infinite] bg-brass" />
        </div>
        <p role="status" className="sr-only">{solve.working ? "Finding a chain…" : solve.data ? "Plan updated." : ""}</p>
        {ownedBlocked ? (
          <p className="mb-3 rounded-md border border-line bg-sunken px-3 py-2 text-sm">This link asks for the parts you own: <Link href={signInHref} className="underline decoration-brass underline-offset-2">sign in</Link> to use them. Until then, the whole catalog is used.</p>
        ) : null}
        {!request ? <EmptyState state={state} exampleHref={exampleHref} />
          : solve.error && !solve.data ? <SolveError error={solve.error} retry={solve.retry} />
            : solve.data ? (
              <div className={solve.stale ? "opacity-60 transition-opacity" : "transition-opacity"}>
                {solve.error ? <div className="mb-3"><SolveError error={solve.error} retry={solve.retry} /></div> : null}
                <PlanResults result={solve.data} state={state} update={update} request={request} renderActions={renderActions} />
              </div>
            ) : (
              <div className="rounded-lg border border-line bg-surface p-6 text-muted">
                <p className="font-medium text-text">Finding a chain…</p>
                <p className="mt-1 text-sm">Mating every joint and filling the back focus with spacers.</p>
                <div className="mt-4 h-40 animate-pulse rounded-md bg-sunken" />
              </div>
            )}
      </div>
      <style>{"@keyframes ty-slide { 0% { transform: translateX(-100%) } 100% { transform: translateX(300%) } }"}</style>
    </div>
  );
}
