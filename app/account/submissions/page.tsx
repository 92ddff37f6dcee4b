import Link from "next/link";
import { listSubmissionsBy } from "@/db/queries/submissions";
import { ButtonLink } from "@/components/ui/button";
import { PageTitle } from "@/components/ui/card";
import { requireUser } from "@/lib/signed-in";
import { KIND_LABELS, formatDay } from "@/lib/format";

export const metadata = { title: "My submissions" };


// Each state has its own glyph and words as well as colour (night mode shows them all in red).
const STATUS = {
  pending: { glyph: "◔", label: "Waiting for a moderator", tone: "border-dashed border-line text-text" },
  approved: { glyph: "✓", label: "In the catalog", tone: "border-ok/60 text-ok" },
  rejected: { glyph: "✕", label: "Not added", tone: "border-bad bg-bad text-bg font-bold" },
} as const;

/** The parts a member submitted and what became of each. */
export default async function SubmissionsPage() {
  const user = await requireUser("/account/submissions");
  // A member's own list: the newest 200 (paging is for the API; nobody submits more here).
  const { items: rows } = await listSubmissionsBy({ userId: user.id, limit: 200 });
  return (
    <div className="max-w-4xl">
      <PageTitle title="My submissions" lead="Parts you sent in. A moderator compares each with its spec sheet; approved parts join the catalog and the planner at once, and you get an e-mail either way.">
        <ButtonLink href="/parts/submit" variant="secondary">Submit a part</ButtonLink>
      </PageTitle>
      {rows.length === 0 ? (
        <p className="rounded-lg border border-dashed border-line bg-surface p-6 text-muted">You have not submitted a part yet. Missing one in the catalog? <Link href="/parts/submit" className="underline decoration-brass underline-offset-4">Submit it</Link>.</p>
      ) : (
        <ul className="space-y-3" aria-label="Your submitted parts, newest first">
          {rows.map((p) => {
            const s = STATUS[p.status as keyof typeof STATUS] ?? STATUS.pending;
            return (
              <li key={p.id} data-status={p.status} className="flex flex-wrap items-start justify-between gap-3 rounded-lg border border-line bg-surface p-4">
                <div className="min-w-0 space-y-1">
                  <h2 className="font-semibold text-ink">
                    {p.status === "approved" ? <Link href={`/parts/${p.slug}`} className="underline-offset-4 hover:underline">{p.maker} {p.model}</Link> : <>{p.maker} {p.model}</>}
                  </h2>
                  <p className="text-sm text-muted">{KIND_LABELS[p.kind] ?? p.kind} · sent {formatDay(p.createdAt)}{p.reviewedAt ? ` · reviewed ${formatDay(p.reviewedAt)}` : ""}</p>
                  {p.reviewReason ? <p className="text-sm text-text">Moderator&apos;s note: <q>{p.reviewReason}</q></p> : null}
                  {p.probableDuplicateOf && p.status === "pending" ? <p className="text-sm text-muted">Looks like <Link className="underline" href={`/parts/${p.probableDuplicateOf}`}>a part already in the catalog</Link>; a moderator will decide.</p> : null}
                </div>
                <span className={`inline-flex shrink-0 items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-xs ${s.tone}`}><span aria-hidden>{s.glyph}</span>{s.label}</span>
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
