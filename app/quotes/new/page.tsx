import Link from "next/link";
import { redirect } from "next/navigation";
import { QuoteRequestForm, type ShopOffer } from "@/components/orders/quote-request-form";
import { PageTitle } from "@/components/ui/card";
import { getSessionUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { loadBuildNeeds, offersFor } from "@/lib/payments/quote-request";

export const metadata = { title: "Ask a shop for a quote" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function NewQuotePage({ searchParams }: Props) {
  const raw = (await searchParams).build;
  const slug = (Array.isArray(raw) ? raw[0] : raw)?.trim() ?? "";
  const user = await getSessionUser();
  if (!user) redirect(`/sign-in?next=${encodeURIComponent(`/quotes/new?build=${slug}`)}`);
  if (!slug) return <Empty title="Which build?" text="Open a saved build and press “Ask a shop for a quote”." />;
  let needs;
  try {
    needs = await loadBuildNeeds({ slug, user });
  } catch (err) {
    if (err instanceof AppError && err.status < 500) return <Empty title="No such build" text={err.message} />;
    throw err;
  }
  const { build, needed, partIds } = needs;
  const offers: ShopOffer[] = (await offersFor(needed, partIds)).map((o) => ({
    slug: o.slug, name: o.name, location: o.location, currency: o.currency, subtotalCents: o.subtotalCents, stockedCount: o.stockedCount, shortCount: o.shortCount,
    lines: o.lines.map((l) => ({ name: l.need.name, count: l.need.count, sku: l.row?.sku ?? null, priceCents: l.row?.priceCents ?? null, available: l.row?.available ?? null })),
  }));

  return (
    <div className="max-w-3xl">
      <nav className="mb-3 text-sm text-muted"><Link href={`/b/${build.slug}`} className="underline-offset-4 hover:underline">{build.title}</Link> / quote</nav>
      <PageTitle title="Ask a shop for a quote" lead="The shop sees the train and the connecting parts you still need, answers with its prices, quantities and shipping, and you pay once for the lot." />
      <section aria-labelledby="need-heading" className="mb-6 rounded-lg border border-line bg-surface p-4">
        <h2 id="need-heading" className="text-sm font-semibold text-ink">Still to buy for this train</h2>
        {needed.length ? (
          <ul className="mt-2 flex flex-wrap gap-2 text-sm">
            {needed.map((n) => <li key={n.slug} className="rounded border border-brass/50 bg-brass/10 px-2 py-0.5 text-brass-ink"><span className="num">{n.count} ×</span> {n.name}</li>)}
          </ul>
        ) : <p className="mt-1 text-sm text-muted">Nothing: you own every connecting part of this build already.</p>}
        <p className="mt-2 text-xs text-muted">Parts in your gear list are left out. The optics, devices and camera are not part of the quote.</p>
      </section>
      {!needed.length ? null : offers.length ? <QuoteRequestForm build={build.slug} offers={offers} neededCount={needed.length} /> : (
        <div className="rounded-lg border border-dashed border-line px-6 py-8 text-center text-muted">No shop on Trainyard stocks these parts yet.</div>
      )}
    </div>
  );
}

function Empty({ title, text }: { title: string; text: string }) {
  return <div className="max-w-xl"><PageTitle title={title} lead={text} /><Link href="/builds" className="text-sm underline decoration-brass underline-offset-4">Browse builds</Link></div>;
}
