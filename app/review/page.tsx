import Link from "next/link";
import { Suspense } from "react";
import { listPendingSubmissions } from "@/db/queries/submissions";
import { InterfaceChip } from "@/components/parts/interface-chip";
import { ReviewActions } from "@/components/review/review-actions";
import { PageTitle } from "@/components/ui/card";
import { CardBones, LoadingRegion } from "@/components/ui/skeleton";
import { allowed } from "@/lib/auth/session";
import { requireUser } from "@/lib/signed-in";
import { KIND_LABELS, formatGrams } from "@/lib/format";
import { formatMm } from "@/lib/units";

export const metadata = { title: "Review" };

export default async function ReviewPage() {
  const user = await requireUser("/review");
  if (!allowed(user, { part: "review" })) return <p className="text-muted">Only moderators review submissions.</p>;
  return (
    <div className="max-w-5xl">
      <PageTitle title="Review queue" lead="Compare each submitted part with its spec sheet. Approved parts join the catalog and the planner at once.">
        <Link href="/review/builds" className="text-sm underline decoration-brass underline-offset-4">Builds to look at →</Link>
      </PageTitle>
      <Suspense fallback={<LoadingRegion label="Loading the review queue…"><CardBones count={3} className="space-y-4" /></LoadingRegion>}>
        <ReviewQueue />
      </Suspense>
    </div>
  );
}

/** The parts waiting for a moderator, oldest first: streamed after the page's title. */
async function ReviewQueue() {
  const { items: pending } = await listPendingSubmissions({ limit: 100 });
  return (
    <>
      {pending.length === 0 ? <p className="rounded-lg border border-line bg-surface p-6 text-muted">Nothing waiting. Thank you.</p> : (
        <ul className="space-y-4">
          {pending.map(({ part, submitter }) => (
            <li key={part.id} className="grid gap-4 rounded-lg border border-line bg-surface p-5 md:grid-cols-[1fr_320px]">
              <div className="space-y-2 text-sm">
                <div className="flex flex-wrap items-baseline gap-2">
                  <h2 className="text-base font-semibold text-ink">{part.maker} {part.model}</h2>
                  <span className="text-muted">{KIND_LABELS[part.kind]}</span>
                  {part.probableDuplicateOf ? <span className="rounded bg-warn/15 px-2 py-0.5 text-xs text-warn">Probable duplicate of <Link className="underline" href={`/parts/${part.probableDuplicateOf}`}>{part.probableDuplicateOf}</Link></span> : null}
                </div>
                <p className="text-muted">From {submitter?.name ?? "a deleted account"} · {part.createdAt.toISOString().slice(0, 10)}</p>
                <div className="flex flex-wrap gap-x-6 gap-y-1">
                  <span>Sky side: {part.frontInterface ? <InterfaceChip code={part.frontInterface} gender={part.frontGender as "male" | "female"} /> : "—"}</span>
                  <span>Sensor side: {part.rearInterface ? <InterfaceChip code={part.rearInterface} gender={part.rearGender as "male" | "female"} /> : "—"}</span>
                  <span className="num">Length {formatMm(part.lengthMm, 2)}{part.adjustMm ? ` + ${part.adjustMm} adjustable` : ""}</span>
                  {part.clearApertureMm ? <span className="num">Clear aperture {formatMm(part.clearApertureMm)}</span> : null}
                  <span className="num">Weight {part.weightG !== null ? formatGrams(part.weightG) : "not given"}</span>
                  <span>{part.reversible ? "Reversible (fits either way round)" : "One way round only"}</span>
                </div>
                {Object.keys(part.specs).length ? <pre className="code overflow-x-auto rounded bg-sunken p-2 text-xs">{JSON.stringify(part.specs, null, 1)}</pre> : null}
                {part.description ? <p className="italic">“{part.description}”</p> : null}
                {part.specSheetKey ? <a className="inline-block underline decoration-brass underline-offset-4" href={`/api/v1/submissions/${part.id}/spec-sheet`} target="_blank" rel="noreferrer">Open the spec sheet</a> : <span className="text-bad">No spec sheet</span>}
              </div>
              <ReviewActions id={part.id} />
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
