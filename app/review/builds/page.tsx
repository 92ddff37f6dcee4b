import { headers } from "next/headers";
import Link from "next/link";
import { listReviewQueue } from "@/db/queries/builds";
import { BuildBadges } from "@/components/builds/badges";
import { ModerationPanel } from "@/components/builds/moderation-panel";
import { PageTitle } from "@/components/ui/card";
import { allowed } from "@/lib/auth/session";
import { requireUser } from "@/lib/signed-in";
import { siteOrigin } from "@/lib/builds/site-url";
import { buildSummary, type BuildListRow } from "@/lib/builds/to-json";
import { formatDay } from "@/lib/format";

export const metadata = { title: "Builds to look at" };


function Row({ row, origin }: { row: BuildListRow; origin: string }) {
  const b = buildSummary(row, origin);
  return (
    <li className={`grid gap-4 rounded-lg border bg-surface p-4 md:grid-cols-[minmax(0,1fr)_26rem] ${!b.fits && b.endorsed ? "border-bad/50" : "border-line"}`}>
      <div className="min-w-0 space-y-1.5 text-sm">
        <BuildBadges endorsed={b.endorsed} fits={b.fits} visibility={b.visibility} hidden={b.hidden} className="gap-1.5" />
        <h2 className="text-base font-semibold text-ink"><Link href={`/b/${b.slug}`} className="underline-offset-4 hover:underline">{b.title}</Link></h2>
        <p className="text-muted">{[b.telescope, b.optics].filter(Boolean).join(" + ")}{b.stations.length ? ` → ${b.stations.join(" → ")}` : ""} → {b.camera} · {b.owner.name} · {formatDay(b.createdAt)}</p>
        <p className="num">Sensor at {b.sensorDistanceMm?.toFixed(2) ?? "—"} mm{b.targetMm !== null ? ` for ${b.targetMm.toFixed(2)} ± ${(b.toleranceMm ?? 0).toFixed(2)} mm` : ""} · {b.partCount ?? "—"} connecting parts</p>
        {!b.fits && b.checkReason ? <p className="text-bad">{b.checkReason}</p> : null}
      </div>
      <ModerationPanel slug={b.slug} endorsed={b.endorsed} hidden={b.hidden} threads={[]} compact />
    </li>
  );
}

export default async function ReviewBuildsPage() {
  const user = await requireUser("/review/builds");
  if (!allowed(user, { build: "moderate" })) return <p className="text-muted">Only moderators look after builds.</p>;
  const { flagged, recent } = await listReviewQueue({ limit: 50 });
  const origin = siteOrigin(await headers());
  return (
    <div className="max-w-6xl space-y-8">
      <PageTitle title="Builds to look at" lead="Reference builds that stopped fitting after a catalog change come first; then the newest builds others can see.">
        <Link href="/review" className="text-sm underline decoration-brass underline-offset-4">← Parts to review</Link>
      </PageTitle>
      <section aria-labelledby="flagged-heading" className="space-y-3">
        <h2 id="flagged-heading" className="text-lg font-semibold text-ink">Reference builds that no longer fit <span className="num text-muted">({flagged.length})</span></h2>
        {flagged.length ? <ul className="space-y-3">{flagged.map((r) => <Row key={r.slug} row={r} origin={origin} />)}</ul>
          : <p className="rounded-lg border border-line bg-surface p-4 text-sm text-muted">Every reference build still fits.</p>}
      </section>
      <section aria-labelledby="recent-heading" className="space-y-3">
        <h2 id="recent-heading" className="text-lg font-semibold text-ink">Recent builds</h2>
        {recent.length ? <ul className="space-y-3">{recent.map((r) => <Row key={r.slug} row={r} origin={origin} />)}</ul>
          : <p className="rounded-lg border border-line bg-surface p-4 text-sm text-muted">No builds yet.</p>}
      </section>
    </div>
  );
}
