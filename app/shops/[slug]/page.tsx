import Link from "next/link";
import { notFound } from "next/navigation";
import { ButtonLink } from "@/components/ui/button";
import { getShopBySlug } from "@/db/queries/shops";
import { listPublicStock, listShopReferenceBuilds } from "@/db/queries/shops-public";
import { KIND_LABELS } from "@/lib/format";
import { formatMoney } from "@/lib/shops/money";


export async function generateMetadata({ params }: { params: Promise<{ slug: string }> }) {
  const shop = await getShopBySlug({ slug: (await params).slug });
  return { title: shop?.name ?? "Shop" };
}

type Line = Awaited<ReturnType<typeof listPublicStock>>[number];

function StockList({ lines }: { lines: Line[] }) {
  return (
    <ul className="divide-y divide-line/60 text-sm">
      {lines.map((s) => (
        <li key={s.slug} className="flex items-baseline justify-between gap-3 py-1.5">
          <Link href={`/parts/${s.slug}`} className="min-w-0 truncate text-text hover:underline">{s.maker} {s.model}</Link>
          <span className="num shrink-0 text-ink">{formatMoney(s.priceCents, s.currency)} <span className="text-xs text-muted">· {s.available} left</span></span>
        </li>
      ))}
    </ul>
  );
}

export default async function ShopPage({ params }: { params: Promise<{ slug: string }> }) {
  const shop = await getShopBySlug({ slug: (await params).slug });
  if (!shop) notFound();
  const [stock, refs] = await Promise.all([listPublicStock({ organizationId: shop.id }), listShopReferenceBuilds({ organizationId: shop.id })]);
  const byKind = new Map<string, typeof stock>();
  for (const s of stock) byKind.set(s.kind, [...(byKind.get(s.kind) ?? []), s]);
  const threads = [...new Set(stock.flatMap((s) => [s.front, s.rear]).filter((t): t is string => !!t))].sort();
  return (
    <article className="max-w-5xl space-y-6">
      <nav className="text-sm text-muted"><Link href="/shops" className="underline-offset-4 hover:underline">Shops</Link> / {shop.name}</nav>
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-semibold tracking-tight text-ink">{shop.name}</h1>
          <p className="mt-1 text-muted">{shop.location}{shop.location ? " · " : ""}prices in <span className="code">{shop.currency}</span></p>
          {shop.about ? <p className="mt-2 max-w-2xl text-text">{shop.about}</p> : null}
        </div>
        <ButtonLink href={`/plan?source=shop&shop=${shop.slug}`}>Plan with this shop&apos;s stock</ButtonLink>
      </header>
      <section aria-labelledby="stock-title" className="rounded-lg border border-line bg-surface p-5">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h2 id="stock-title" className="text-lg font-semibold text-ink">What it stocks</h2>
          <p className="text-sm text-muted"><span className="num font-semibold text-text">{stock.length}</span> parts available now</p>
        </div>
        {threads.length ? <p className="mt-2 flex flex-wrap gap-1.5">{threads.map((t) => <span key={t} className="code rounded border border-line bg-bg px-1.5 py-0.5 text-xs">{t}</span>)}</p> : null}
        {stock.length ? (
          <div className="mt-4 grid gap-5 md:grid-cols-2">
            {[...byKind].map(([kind, list]) => (
              <div key={kind}>
                <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-muted">{KIND_LABELS[kind] ?? kind} · {list.length}</h3>
                <StockList lines={list.slice(0, 12)} />
                {list.length > 12 ? (
                  <details className="text-sm">
                    <summary className="cursor-pointer py-1.5 text-xs text-muted hover:text-text">and {list.length - 12} more</summary>
                    <StockList lines={list.slice(12)} />
                  </details>
                ) : null}
              </div>
            ))}
          </div>
        ) : <p className="mt-2 text-muted">Nothing in stock right now.</p>}
      </section>
      <section aria-labelledby="refs-title" className="rounded-lg border border-line bg-surface p-5">
        <h2 id="refs-title" className="text-lg font-semibold text-ink">Reference builds with its parts</h2>
        {refs.length ? (
          <ul className="mt-2 divide-y divide-line/60 text-sm">
            {refs.map((b) => <li key={b.slug} className="flex justify-between gap-3 py-2"><Link href={`/b/${b.slug}`} className="text-text hover:underline">{b.title}</Link><span className="num text-muted">{b.stockedCount} of {b.partCount} parts here</span></li>)}
          </ul>
        ) : <p className="mt-1 text-sm text-muted">No endorsed reference build uses its parts yet.</p>}
      </section>
    </article>
  );
}
