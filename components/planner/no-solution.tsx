"use client";
// When nothing lands in the window: why, the nearest reachable distances, and what to change.
import { listAnd } from "@/lib/format";
import Link from "next/link";
import type { PlanResponse } from "@/lib/planner/api-types";
import type { Change } from "@/lib/planner/what-to-change";
import { INTERFACES, interfaceLabel } from "@/lib/interfaces";
import { formatLength, type LengthUnit } from "@/lib/units";
import { itemName } from "./train-model";

/** Interfaces the reason names; failing that, every face the chosen parts offer. */
export function interfacesInvolved(result: PlanResponse): string[] {
  const reason = result.reason ?? "";
  const named = INTERFACES.filter((i) => reason.includes(i.code) || reason.includes(i.name)).map((i) => i.code);
  if (named.length) return named;
  const ctx = result.context;
  const faces = [ctx.items[ctx.opticsId]?.rear, ...ctx.stationIds.flatMap((id) => [ctx.items[id]?.front, ctx.items[id]?.rear]), ctx.items[ctx.cameraId]?.front];
  return [...new Set(faces.filter((f) => !!f).map((f) => f!.interface))];
}

function Suggestion({ children }: { children: React.ReactNode }) {
  return <li className="flex gap-2"><span aria-hidden className="text-brass-ink">→</span><span>{children}</span></li>;
}

const linkClass = "underline decoration-brass underline-offset-2 hover:text-ink";

export type RemedyPatch = { removeStations: number[]; camera?: string; corrector?: string };

function changeText(result: PlanResponse, c: Change): string {
  const name = itemName(result, c.id);
  if (c.kind === "remove-station") return `remove the ${name}`;
  if (c.kind === "replace-camera") return `use the ${name} instead of the ${itemName(result, result.context.cameraId)}`;
  return `use the ${name} as the corrector`;
}

/** The smallest changes that make the train land in the window, each one click away. */
function Remedies({ result, unit, onApply }: { result: PlanResponse; unit: LengthUnit; onApply: (patch: RemedyPatch) => void }) {
  const remedies = result.remedies ?? [];
  if (!remedies.length) {
    return <p className="mt-2" data-testid="remedies-none">No single change, nor any two changes, of your devices, camera{result.context.telescopeId ? " or corrector" : ""} to one the catalog holds makes this train land in the window.</p>;
  }
  const single = remedies[0].changes.length === 1;
  return (
    <>
      <p className="mt-2">{single ? "Each of these makes the train land in the window:" : "No single change does it; each of these pairs does:"}</p>
      <ul className="mt-1.5 space-y-1.5" data-testid="remedies">
        {remedies.map((r, i) => {
          const text = listAnd(r.changes.map((c) => changeText(result, c)));
          const patch: RemedyPatch = { removeStations: r.changes.filter((c) => c.kind === "remove-station").map((c) => (c as { index: number }).index) };
          for (const c of r.changes) { if (c.kind === "replace-camera") patch.camera = c.id; if (c.kind === "replace-corrector") patch.corrector = c.id; }
          return (
            <Suggestion key={i}>
              {text[0].toUpperCase() + text.slice(1)}: the sensor lands at <span className="num">{formatLength(r.sensorDistanceMm, unit)}</span>
              {" "}with {r.partCount} connecting part{r.partCount === 1 ? "" : "s"}.{" "}
              <button type="button" className={linkClass} onClick={() => onApply(patch)}>Do that</button>
            </Suggestion>
          );
        })}
      </ul>
    </>
  );
}

export function NoSolution({ result, unit, onApply }: { result: PlanResponse; unit: LengthUnit; onApply: (patch: RemedyPatch) => void }) {
  const L = (mm: number) => formatLength(mm, unit);
  /** Finer, for windows and gaps that are fractions of a millimetre. */
  const F = (mm: number) => (unit === "in" ? formatLength(mm, "in") : `${mm.toFixed(2)} mm`);
  const T = result.targetMm, tol = result.toleranceMm ?? 0;
  const ctx = result.context;
  const shortest = result.shortest;
  const firstJoint = shortest?.steps[0]?.joint.interface ?? ctx.items[ctx.opticsId]?.rear?.interface;

  let body: React.ReactNode = null;
  if (result.status === "too-long" && T !== null && shortest) {
    const over = shortest.sensorDistanceMm - (T + tol);
    body = (
      <>
        <p>The shortest chain that joins everything is already <strong className="num">{L(shortest.sensorDistanceMm)}</strong>, <strong className="num text-bad">{F(over)}</strong> past the far edge of the window ({F(T + tol)}).</p>
        <Remedies result={result} unit={unit} onApply={onApply} />
      </>
    );
  } else if (result.status === "out-of-reach" && T !== null) {
    const below = result.nearest?.belowMm ?? null, above = result.nearest?.aboveMm ?? null;
    const spacerHref = `/parts?kind=spacer${firstJoint ? `&interface=${encodeURIComponent(firstJoint)}` : ""}`;
    body = (
      <>
        <p>Chains exist, but none lands between <span className="num">{F(T - tol)}</span> and <span className="num">{F(T + tol)}</span>.</p>
        <ul className="mt-2 space-y-1.5">
          {below !== null ? (
            <Suggestion>
              The nearest below lands at <strong className="num">{F(below)}</strong>, <strong className="num">{F(T - below)}</strong> short. A spacer of <strong className="num">{F(T - below)}</strong>
              {" "}(anything from {F(Math.max(0, T - below - tol))} to {F(T - below + tol)}) added to it closes the gap.{" "}
              <Link className={linkClass} href={spacerHref}>Find a {firstJoint ? interfaceLabel(firstJoint) : ""} spacer</Link>
            </Suggestion>
          ) : null}
          {above !== null ? <Suggestion>The nearest above lands at <strong className="num">{F(above)}</strong>, <strong className="num">{F(above - T)}</strong> too far: a thinner part in it would have to save that much.</Suggestion> : null}
          {result.remedies?.length ? <li><Remedies result={result} unit={unit} onApply={onApply} /></li> : null}
          {result.context.source === "owned" ? <Suggestion>Let the planner use the whole catalog as well as what you own.</Suggestion> : null}
          <Suggestion>A tolerance override wider than ±{F(tol)} also counts nearer chains — only if the corrector&apos;s maker allows it.</Suggestion>
        </ul>
      </>
    );
  } else if (result.missingJoint) {
    const mj = result.missingJoint;
    const codes = [mj.sky?.interface, mj.sensor?.interface].filter((c): c is string => !!c);
    body = (
      <>
        <p>Between the {itemName(result, mj.skyId)} and the {itemName(result, mj.sensorId)} the train needs {mj.needed ?? "an adapter"}.</p>
        <ul className="mt-2 space-y-1.5">
          {mj.adapterIds.length ? mj.adapterIds.slice(0, 3).map((id) => (
            <Suggestion key={id}><Link className={linkClass} href={`/parts/${id}`}>{itemName(result, id)}</Link> joins them.</Suggestion>
          )) : <Suggestion>There is none in the catalog. Choose a corrector made for this telescope&apos;s focuser, or <Link className={linkClass} href="/parts/submit">submit the adapter</Link> if you know one.</Suggestion>}
          {codes.map((code) => (
            <Suggestion key={code}><Link className={linkClass} href={`/parts?interface=${encodeURIComponent(code)}`}>Parts with <span className="code">{interfaceLabel(code)}</span></Link></Suggestion>
          ))}
        </ul>
      </>
    );
  } else if (result.status === "no-connection") {
    const codes = interfacesInvolved(result);
    body = (
      <>
        <p>{result.reason ? "Adapters that could close the gap:" : "No chain of parts mates these faces."}</p>
        <ul className="mt-2 space-y-1.5">
          {codes.map((code) => (
            <Suggestion key={code}>
              <Link className={linkClass} href={`/parts?interface=${encodeURIComponent(code)}`}>Find adapters with <span className="code">{interfaceLabel(code)}</span></Link>
            </Suggestion>
          ))}
          <Suggestion>Threads mate only with the same size, pitch and the opposite gender: <span className="code">M42x1</span> does not fit <span className="code">M42x0.75</span>.</Suggestion>
        </ul>
      </>
    );
  }

  return (
    <section aria-label="What to change" className="rounded-lg border border-warn/50 bg-warn/5 p-4 text-sm text-text">
      <h3 className="mb-1.5 font-semibold text-ink">What to change</h3>
      {body}
    </section>
  );
}
