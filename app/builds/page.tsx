import { headers } from "next/headers";
import Link from "next/link";
import { Suspense } from "react";
import { listBuilds } from "@/db/queries/builds";
import { BuildCard } from "@/components/builds/build-card";
import { PageTitle } from "@/components/ui/card";
import { ButtonLink } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { CardBones, LoadingRegion } from "@/components/ui/skeleton";
import { getSessionUser } from "@/lib/auth/session";
import { siteOrigin } from "@/lib/builds/site-url";
import { buildSummary } from "@/lib/builds/to-json";
import { listBuildsQuerySchema } from "@/lib/validation/builds";

export const metadata = { title: "Builds", description: "Saved imaging trains that reach focus; reference builds are checked by moderators." };

// Drawn by us, so night mode has no white box.
const CHECKBOX = "grid h-4 w-4 shrink-0 appearance-none place-content-center rounded-[3px] border border-muted bg-surface before:h-2 before:w-2 before:scale-0 before:rounded-[1px] before:bg-bg before:content-[''] checked:border-ink checked:bg-ink checked:before:scale-100 night:checked:border-brass night:checked:bg-brass night:before:bg-black";

type Search = Record<string, string | string[] | undefined>;
const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default async function BuildsPage({ searchParams }: { searchParams: Promise<Search> }) {
  const raw = await searchParams;
  const user = await getSessionUser().catch(() => null);
  const parsed = listBuildsQuerySchema.safeParse({ q: first(raw.q), reference: first(raw.reference), mine: first(raw.mine), cursor: first(raw.cursor) });
  const query = parsed.success ? parsed.data : listBuildsQuerySchema.parse({});
  const mine = query.mine && !!user;

  return (
    <div>
      <PageTitle title={mine ? "Your builds" : "Builds"}
        lead={mine ? "Everything you saved, private and unlisted too." : "Saved trains that reach focus. Reference builds are checked and endorsed by moderators, and re-checked whenever a part they use changes."}>
        <ButtonLink href="/plan">Plan a train</ButtonLink>
      </PageTitle>

      <form method="get" action="/builds" className="mb-6 flex flex-wrap items-end gap-3 rounded-lg border border-line bg-surface p-3" role="search">
        <label className="min-w-[14rem] flex-1 text-sm">
          <span className="mb-1 block font-medium">Search</span>
          <input name="q" type="search" defaultValue={query.q ?? ""} placeholder="Title, notes or part: flattener, M48, wheel…" className={inputClass} />
        </label>
        <label className="flex items-center gap-2 py-2 text-sm">
          <input type="checkbox" name="reference" value="1" defaultChecked={query.reference} className={CHECKBOX} />
          Reference builds only
        </label>
        {user ? (
          <label className="flex items-center gap-2 py-2 text-sm">
            <input type="checkbox" name="mine" value="1" defaultChecked={mine} className={CHECKBOX} />
            Only mine
          </label>
        ) : null}
        <button type="submit" className="rounded-md bg-ink px-4 py-2 text-sm font-medium text-bg hover:bg-ink/90">Filter</button>
        {query.q || query.reference || mine ? <Link href="/builds" className="py-2 text-sm text-muted underline underline-offset-4">Clear</Link> : null}
      </form>

      {!parsed.success ? <p className="mb-4 text-sm text-bad">Some filters were not understood and were ignored.</p> : null}
      {/* Keyed by the filters, so a new search shows the placeholder rather than the old list. */}
      <Suspense key={JSON.stringify({ ...query, mine })} fallback={<LoadingRegion label="Loading the builds…"><CardBones count={6} className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3" /></LoadingRegion>}>
        <BuildResults query={query} mine={mine} ownerId={user?.id ?? null} />
      </Suspense>
    </div>
  );
}

type BuildsQuery = ReturnType<typeof listBuildsQuerySchema.parse>;

/** The matching builds and the link to the next page: streamed after the page's title and filters. */
async function BuildResults({ query, mine, ownerId }: { query: BuildsQuery; mine: boolean; ownerId: string | null }) {
  const { items, nextCursor } = await listBuilds({ query: { ...query, mine }, ownerId });
  const origin = siteOrigin(await headers());
  const params = (extra: Record<string, string | undefined>) => {
    const p = new URLSearchParams();
    const all = { q: query.q || undefined, reference: query.reference ? "1" : undefined, mine: mine ? "1" : undefined, ...extra };
    for (const [k, v] of Object.entries(all)) if (v) p.set(k, v);
    const s = p.toString();
    return s ? `/builds?${s}` : "/builds";
  };
  return (
    <>
      {items.length ? (
        <ul className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3">
          {items.map((row) => <BuildCard key={row.slug} build={buildSummary(row, origin)} showVisibility={mine} />)}
        </ul>
      ) : (
        <div className="rounded-lg border border-dashed border-line px-6 py-10 text-center text-muted">
          {query.q || query.reference ? "No builds match these filters." : mine ? "You have not saved a build yet: plan a train and press “Save as link”." : "No public builds yet: plan a train and save it as a link."}
        </div>
      )}
      {nextCursor ? <div className="mt-6 text-center"><ButtonLink href={params({ cursor: nextCursor })} variant="secondary">More builds</ButtonLink></div> : null}
    </>
  );
}
