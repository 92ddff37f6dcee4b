import type { Metadata } from "next";
import { headers } from "next/headers";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AuditLog } from "@/components/builds/audit-log";
import { BuildBadges } from "@/components/builds/badges";
import { BuildFacts } from "@/components/builds/build-facts";
import { ModerationPanel } from "@/components/builds/moderation-panel";
import { QuoteRequestPanel } from "@/components/orders/quote-request-panel";
import { OwnerPanel } from "@/components/builds/owner-panel";
import { PartsList } from "@/components/builds/parts-list";
import { BuildWhereToBuy } from "@/components/shops/build-where-to-buy";
import { SharePanel } from "@/components/builds/share-panel";
import { TrainFigure } from "@/components/builds/train-figure";
import { TrainList } from "@/components/builds/train-list";
import { SafetyNote } from "@/components/safety-note";
import { ButtonLink } from "@/components/ui/button";
import { canDeleteBuild, hasPublicPreview } from "@/lib/builds/access";
import { chosenChain, shoppingList } from "@/lib/builds/chain";
import { loadBuildForPage } from "@/lib/builds/load";
import { planHrefOf } from "@/lib/builds/plan-href";
import { buildImageUrl, buildUrl, siteOrigin } from "@/lib/builds/site-url";
import { htmlSnippet, markdownSnippet } from "@/lib/builds/snippets";
import { buildTrainOf } from "@/lib/builds/train";
import { formatDay } from "@/lib/format";
import type { PlanResponse } from "@/lib/planner/api-types";
import type { PlanInput } from "@/lib/planner/run-plan";
import type { BuildVisibility } from "@/lib/validation/builds";

export const dynamic = "force-dynamic";
type Props = { params: Promise<{ slug: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { slug } = await params;
  const origin = siteOrigin(await headers());
  const loaded = await loadBuildForPage(slug);
  if (!loaded) return { title: "Build not found", robots: { index: false } };
  const { build } = loaded;
  const result = build.result as PlanResponse;
  const chain = chosenChain(result, build.solutionIndex);
  const description = chain
    ? `Sensor at ${chain.sensorDistanceMm.toFixed(1)} mm${result.targetMm !== null ? ` for a ${result.targetMm.toFixed(1)} mm target` : ""}, ${chain.partCount} connecting part${chain.partCount === 1 ? "" : "s"}.${build.endorsedAt ? " A moderator's reference build." : ""}`
    : "A saved imaging train.";
  // Our own absolute address (the visitor's host), versioned so forums fetch a changed picture again.
  const version = `${build.updatedAt.getTime().toString(36)}${build.endorsedAt ? "e" : ""}${build.fits ? "" : "x"}`;
  const image = hasPublicPreview(build)
    ? { url: `${buildImageUrl(origin, build.slug)}?v=${version}`, width: 1200, height: 630, type: "image/png", alt: `${build.title}: the train from sky to sensor` }
    : null;
  return {
    metadataBase: new URL(origin),
    title: build.title,
    description,
    robots: build.visibility === "public" && !build.hiddenAt ? undefined : { index: false },
    alternates: { canonical: buildUrl(origin, build.slug) },
    openGraph: { title: build.title, description, type: "article", url: buildUrl(origin, build.slug), siteName: "Trainyard", images: image ? [image] : [] },
    twitter: { card: "summary_large_image", title: build.title, description, images: image ? [image] : [] },
  };
}

export default async function BuildPage({ params }: Props) {
  const { slug } = await params;
  const loaded = await loadBuildForPage(slug);
  if (!loaded) notFound();
  const { build, ownerName, endorserName, threads, audit, moderator, owner, viewer } = loaded;
  const result = build.result as PlanResponse;
  const chain = chosenChain(result, build.solutionIndex);
  if (!chain) notFound();
  const origin = siteOrigin(await headers());
  const snippet = { title: build.title, url: buildUrl(origin, build.slug), imageUrl: buildImageUrl(origin, build.slug), endorsed: !!build.endorsedAt };
  const lines = shoppingList(result, chain);
  const train = buildTrainOf(result, chain);

  return (
    <article className="space-y-6">
      <nav className="text-sm text-muted"><Link href="/builds" className="underline-offset-4 hover:underline">Builds</Link> / {build.slug}</nav>

      {build.hiddenAt ? (
        <div role="status" className="rounded-lg border border-warn/50 bg-warn/10 px-4 py-3 text-sm">
          <strong className="text-warn">Hidden by a moderator</strong>: only {owner ? "you" : "the owner"} and moderators can open this link.
          {build.hiddenReason ? <> Reason: <q>{build.hiddenReason}</q></> : null}
        </div>
      ) : null}
      {!build.fits ? (
        <div role="alert" className="rounded-lg border border-bad/50 bg-bad/10 px-4 py-3 text-sm">
          <strong className="text-bad">No longer fits.</strong> A catalog part this build uses has changed. {build.checkReason}
          <span className="text-muted"> Checked {formatDay(build.checkedAt)}.</span>
        </div>
      ) : null}

      <header className="flex flex-wrap items-end justify-between gap-4">
        <div className="min-w-0 space-y-2">
          <BuildBadges endorsed={!!build.endorsedAt} fits={build.fits} visibility={build.visibility} hidden={!!build.hiddenAt} />
          <h1 className="break-words text-2xl font-semibold tracking-tight text-ink sm:text-3xl">{build.title}</h1>
          <p className="text-sm text-muted">
            Saved by {ownerName} on {formatDay(build.createdAt)}
            {build.endorsedAt ? <> · endorsed{endorserName ? ` by ${endorserName}` : ""} on {formatDay(build.endorsedAt)}</> : null}
            {build.fits ? <> · re-checked {formatDay(build.checkedAt)}</> : null}
          </p>
        </div>
        <ButtonLink href={planHrefOf(build.request as PlanInput, result, build.solutionIndex)} variant="secondary">Open in planner</ButtonLink>
      </header>

      <BuildFacts result={result} chain={chain} stale={!build.fits} />

      <section aria-labelledby="train-heading" className="rounded-lg border border-line bg-surface p-4">
        <h2 id="train-heading" className="sr-only">The train</h2>
        {/* Phones get the train as a list; the drawing needs about 640 px to stay legible. */}
        <TrainList train={train} className="sm:hidden" />
        <p className="mt-2 text-xs text-muted sm:hidden">Sky at the top, sensor at the bottom; each joint gives the thread or barrel and which side is male (♂) or female (♀). The sensor lands at <span className="num">{chain.sensorDistanceMm.toFixed(2)} mm</span>.</p>
        {/* biome-ignore lint/a11y/noNoninteractiveTabindex: a scrolling region must take the focus so a keyboard can scroll it (WCAG 2.1.1) */}
        <div className="hidden overflow-x-auto sm:block" tabIndex={0} role="region" aria-label="Train drawing">
          <TrainFigure train={train} chain={chain} targetMm={result.targetMm} toleranceMm={result.toleranceMm} filterShiftMm={result.filterShiftMm} />
        </div>
        <p className="mt-2 hidden text-xs text-muted sm:block">Sky on the left, sensor on the right. Behind the optics every box is drawn to scale; joint labels give the thread or barrel and which side is male (♂) or female (♀).</p>
      </section>

      {chain.warnings.length ? (
        <ul className="space-y-1.5 rounded-lg border border-warn/40 bg-warn/5 px-4 py-3 text-sm">
          {chain.warnings.map((w, i) => <li key={i}><strong className="text-warn">{w.code === "vignetting" ? "Vignetting" : w.code === "load" ? "Load" : w.code === "image-circle" ? "Image circle" : "Check"}:</strong> {w.message}</li>)}
        </ul>
      ) : null}

      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="min-w-0 space-y-6">
          <section aria-labelledby="parts-heading" className="space-y-3">
            <h2 id="parts-heading" className="text-lg font-semibold text-ink">Parts, sky to sensor</h2>
            <PartsList lines={lines} />
          </section>
          <section aria-labelledby="notes-heading" className="space-y-2">
            <h2 id="notes-heading" className="text-lg font-semibold text-ink">Notes</h2>
            {build.notes ? <p className="whitespace-pre-line break-words rounded-lg border border-line bg-surface px-4 py-3 text-text">{build.notes}</p> : <p className="text-sm text-muted">No notes.</p>}
          </section>
          {threads.length && !moderator ? (
            <section aria-labelledby="threads-heading" className="space-y-2">
              <h2 id="threads-heading" className="text-lg font-semibold text-ink">Linked from</h2>
              <ul className="space-y-1 text-sm">{threads.map((t) => <li key={t.url}><a href={t.url} rel="nofollow noopener noreferrer" className="break-all text-brass-ink underline-offset-4 hover:underline">{t.url}</a></li>)}</ul>
            </section>
          ) : null}
          <SafetyNote compact />
        </div>

        <aside className="space-y-6">
          {lines.some((l) => l.toBuy) || !owner ? <QuoteRequestPanel slug={build.slug} signedIn={!!viewer} /> : null}
          <BuildWhereToBuy lines={lines.filter((l) => l.toBuy).map((l) => ({ slug: l.item.slug, name: l.item.name, count: l.count }))} />
          <section aria-labelledby="share-heading" className="space-y-3 rounded-lg border border-line bg-surface p-4">
            <h2 id="share-heading" className="font-semibold text-ink">Share</h2>
            <SharePanel url={snippet.url} markdown={markdownSnippet(snippet)} html={htmlSnippet(snippet)} previewable={hasPublicPreview(build)}
              noPreviewReason={build.hiddenAt ? "hidden" : "private"} />
          </section>
          {owner ? (
            <section aria-labelledby="owner-heading" className="space-y-3 rounded-lg border border-line bg-surface p-4">
              <h2 id="owner-heading" className="font-semibold text-ink">Your build</h2>
              <OwnerPanel slug={build.slug} title={build.title} notes={build.notes} visibility={build.visibility as BuildVisibility} />
            </section>
          ) : canDeleteBuild(build, viewer) ? (
            <section aria-labelledby="admin-heading" className="space-y-3 rounded-lg border border-line bg-surface p-4">
              <h2 id="admin-heading" className="font-semibold text-ink">Admin</h2>
              <OwnerPanel slug={build.slug} title={build.title} notes={build.notes} visibility={build.visibility as BuildVisibility} deleteOnly />
            </section>
          ) : null}
          {moderator ? (
            <section aria-labelledby="mod-heading" className="space-y-4 rounded-lg border border-brass/40 bg-surface p-4">
              <h2 id="mod-heading" className="font-semibold text-ink">Moderation</h2>
              <ModerationPanel slug={build.slug} endorsed={!!build.endorsedAt} hidden={!!build.hiddenAt} threads={threads.map((t) => t.url)} />
              <div className="space-y-2 border-t border-line pt-3">
                <h3 className="text-sm font-semibold text-ink">Audit log</h3>
                <AuditLog entries={audit} />
              </div>
            </section>
          ) : null}
        </aside>
      </div>
    </article>
  );
}
