import "server-only";
// `source: { kind: "shops" }`: the same question asked of every shop with stock; the best chain
// each one can supply from what it has, at its prices, answerable shops first.
import { listShops } from "@/db/queries/shops";
import type { SessionUser } from "@/lib/auth/session";
import type { PlanResponse } from "@/lib/planner/api-types";
import { runPlan, type PlanInput } from "@/lib/planner/run-plan";

export async function planAcrossShops({ input, viewer }: { input: PlanInput; viewer: SessionUser | null }) {
  const shops = (await listShops()).filter((s) => s.inStock > 0);
  const answers = [];
  for (const shop of shops) {
    const r = (await runPlan({ input: { ...input, source: { kind: "shop", shop: shop.slug } }, viewer })) as PlanResponse;
    const chain = r.solutions[0] ?? null;
    const used = chain ? Object.fromEntries(chain.steps.map((s) => [s.partId, r.context.items[s.partId]]).filter(([, v]) => v)) : {};
    answers.push({
      shop: { slug: shop.slug, name: shop.name, location: shop.location, currency: shop.currency },
      status: r.status, reason: r.reason ?? null, chain, totalCents: chain?.priceCents ?? null, items: used,
    });
  }
  answers.sort((a, b) => Number(b.status === "ok") - Number(a.status === "ok")
    || (a.chain?.steps.length ?? 99) - (b.chain?.steps.length ?? 99) || a.shop.name.localeCompare(b.shop.name));
  return { source: "shops" as const, status: answers.some((a) => a.status === "ok") ? "ok" : "no-shop", shops: answers };
}
