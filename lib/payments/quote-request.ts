import "server-only";
import { getBuildOrThrow } from "@/db/queries/builds";
import { listOwnedParts } from "@/db/queries/gear";
import { getShopBySlug, listShopMemberEmails, listShopsStocking, partIdsBySlug } from "@/db/queries/orders";
import { insertQuoteRequest, type NewQuoteLine } from "@/db/queries/orders-write";
import type { SessionUser } from "@/lib/auth/session";
import { toBuildViewer } from "@/lib/builds/access";
import { chosenChain } from "@/lib/builds/chain";
import { AppError } from "@/lib/errors";
import type { PlanResponse } from "@/lib/planner/api-types";
import type { CreateQuoteInput } from "@/lib/validation/orders";
import { partsToBuy, trainNames, type NeededPart } from "./build-lines";
import { orderMail } from "./mail";

/** A build the user may see, and what they still have to buy for it (their own gear counts as bought). */
export async function loadBuildNeeds({ slug, user }: { slug: string; user: SessionUser }) {
  const { build } = await getBuildOrThrow({ slug, viewer: toBuildViewer(user) });
  const result = build.result as PlanResponse;
  const chain = chosenChain(result, build.solutionIndex);
  if (!chain) throw new AppError("bad_request:validation", "This build has no chain to quote.", { build: ["No chain saved"] });
  const owned = new Map((await listOwnedParts({ userId: user.id })).map((o) => [o.part.slug, o.quantity]));
  const needed = partsToBuy(result, chain, owned);
  const partIds = await partIdsBySlug({ slugs: needed.map((n) => n.slug) });
  return { build, result, chain, needed, partIds };
}

/** Each shop that stocks any of the needed parts: what it has of them and at what price. */
export async function offersFor(needed: NeededPart[], partIds: Map<string, string>) {
  const shops = await listShopsStocking({ partIds: [...partIds.values()] });
  return shops.map((shop) => {
    const lines = needed.map((n) => ({ need: n, row: shop.rows.find((r) => r.partId === partIds.get(n.slug)) ?? null }));
    const stocked = lines.filter((l) => l.row);
    const currency = stocked[0]?.row?.currency ?? "USD";
    return {
      id: shop.id, name: shop.name, slug: shop.slug, location: shop.location, currency, lines,
      stockedCount: stocked.length,
      subtotalCents: stocked.reduce((s, l) => s + (l.row!.currency === currency ? l.row!.priceCents * l.need.count : 0), 0),
      shortCount: stocked.filter((l) => l.row!.available < l.need.count).length,
    };
  }).sort((a, b) => b.stockedCount - a.stockedCount || a.subtotalCents - b.subtotalCents);
}

export async function createQuoteRequest({ input, user }: { input: CreateQuoteInput; user: SessionUser }) {
  const { build, result, chain, needed, partIds } = await loadBuildNeeds({ slug: input.build, user });
  if (!needed.length) throw new AppError("bad_request:validation", "You own every connecting part of this build: there is nothing to buy.", { build: ["Nothing left to buy"] });
  const shop = await getShopBySlug({ slug: input.shop });
  if (!shop) throw new AppError("bad_request:validation", "There is no shop with this name.", { shop: ["Choose one of the shops listed"] });
  const offer = (await offersFor(needed, partIds)).find((o) => o.id === shop.id);
  const currency = shop.currency ?? offer?.currency ?? "USD";
  const lines: NewQuoteLine[] = [];
  const missing: { partId: string; name: string; count: number }[] = [];
  for (const { need, row } of offer?.lines ?? needed.map((need) => ({ need, row: null }))) {
    if (row && row.currency === currency) lines.push({ inventoryId: row.inventoryId, partId: row.partId, sku: row.sku, name: need.name, quantity: need.count, unitPriceCents: row.priceCents });
    else missing.push({ partId: partIds.get(need.slug) ?? need.slug, name: need.name, count: need.count });
  }
  if (!lines.length) throw new AppError("bad_request:validation", `${shop.name} stocks none of the parts still to buy.`, { shop: ["This shop stocks none of these parts"] });
  const quote = await insertQuoteRequest({
    values: { buyerId: user.id, organizationId: shop.id, buildId: build.id, buildSlug: build.slug, buildTitle: build.title, train: trainNames(result, chain), missing, buyerNote: input.note || null, currency },
    lines,
  });
  await orderMail.requested(quote, await listShopMemberEmails({ organizationId: shop.id }), user.name);
  return quote;
}
