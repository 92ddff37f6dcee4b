import { whereToBuyForParts } from "@/lib/shops/where-to-buy-query";
import { WhereToBuyOffers } from "./where-to-buy-offers";

/** The build page's "Where to buy", worked out on the server. */
export async function BuildWhereToBuy({ lines }: { lines: { slug: string; name: string; count: number }[] }) {
  const parts = lines.slice(0, 50).map((l) => ({ slug: l.slug, quantity: Math.min(100, l.count) }));
  const offers = parts.length ? await whereToBuyForParts({ input: { parts }, names: new Map(lines.map((l) => [l.slug, l.name])) }) : [];
  return (
    <section aria-labelledby="where-to-buy" className="space-y-2 rounded-lg border border-line bg-surface p-4">
      <h2 id="where-to-buy" className="font-semibold text-ink">Where to buy</h2>
      {parts.length ? <WhereToBuyOffers offers={offers} partsCount={parts.length} /> : <p className="text-sm text-muted">Nothing to buy: every connecting part is owned.</p>}
    </section>
  );
}
