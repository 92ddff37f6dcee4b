// Which shops can supply the parts still to buy: per shop, what it has (at its price, in its
// currency), what it lacks or has too few of, and the total of what it can supply. Pure.

export type Need = { slug: string; name: string; quantity: number };
export type StockLine = { slug: string; priceCents: number; currency: string; available: number };
export type ShopStock = { slug: string; name: string; currency: string; lines: Map<string, StockLine> };

export type ShopOffer = {
  shop: { slug: string; name: string };
  /** The shop's currency; lines in another currency are totalled separately. */
  totals: { currency: string; cents: number }[];
  supplied: { slug: string; name: string; quantity: number; priceCents: number; currency: string }[];
  lacks: { slug: string; name: string; needed: number; available: number }[];
  complete: boolean;
};

export function whereToBuy(needs: Need[], shops: ShopStock[]): ShopOffer[] {
  const offers = shops.map((shop): ShopOffer => {
    const supplied: ShopOffer["supplied"] = [];
    const lacks: ShopOffer["lacks"] = [];
    const totals = new Map<string, number>();
    for (const need of needs) {
      const line = shop.lines.get(need.slug);
      const available = line?.available ?? 0;
      if (!line || available < need.quantity) { lacks.push({ slug: need.slug, name: need.name, needed: need.quantity, available }); continue; }
      supplied.push({ slug: need.slug, name: need.name, quantity: need.quantity, priceCents: line.priceCents, currency: line.currency });
      totals.set(line.currency, (totals.get(line.currency) ?? 0) + line.priceCents * need.quantity);
    }
    return {
      shop: { slug: shop.slug, name: shop.name },
      totals: [...totals].map(([currency, cents]) => ({ currency, cents })),
      supplied, lacks, complete: lacks.length === 0,
    };
  });
  // Shops that can supply everything first, then the ones that lack the fewest parts.
  return offers.filter((o) => o.supplied.length > 0)
    .sort((a, b) => Number(b.complete) - Number(a.complete) || a.lacks.length - b.lacks.length || a.shop.name.localeCompare(b.shop.name));
}
