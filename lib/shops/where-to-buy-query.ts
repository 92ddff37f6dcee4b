import "server-only";
import { listStockOfParts } from "@/db/queries/shops-inventory";
import { listShops } from "@/db/queries/shops";
import type { WhereToBuyInput } from "@/lib/validation/shops";
import { whereToBuy, type Need, type ShopStock } from "./where-to-buy";

/** Every shop's offer for these parts (names come from the caller's plan, keyed by slug). */
export async function whereToBuyForParts({ input, names }: { input: WhereToBuyInput; names?: Map<string, string> }) {
  const needs: Need[] = [];
  const bySlug = new Map<string, Need>();
  for (const p of input.parts) {
    const prev = bySlug.get(p.slug);
    if (prev) { prev.quantity += p.quantity; continue; }
    const need = { slug: p.slug, name: names?.get(p.slug) ?? p.slug, quantity: p.quantity };
    bySlug.set(p.slug, need); needs.push(need);
  }
  const [stock, shops] = await Promise.all([listStockOfParts({ slugs: needs.map((n) => n.slug) }), listShops()]);
  const byShop = new Map<string, ShopStock>(shops.map((s) => [s.slug, { slug: s.slug, name: s.name, currency: s.currency, lines: new Map() }]));
  for (const line of stock) {
    byShop.get(line.shopSlug)?.lines.set(line.partSlug, { slug: line.partSlug, priceCents: line.priceCents, currency: line.currency, available: line.available });
  }
  return whereToBuy(needs, [...byShop.values()]);
}
