import { HydrationBoundary } from "@tanstack/react-query";
import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/card";
import { getSessionUser } from "@/lib/auth/session";
import { parsePlanParams, planStateToParams } from "@/lib/planner/url-state";
import { firstAnswer } from "./first-answer";
import { PlanWorkbench } from "./plan-workbench";
import { defaultShopSource } from "@/lib/shops/default-source";
import { EXAMPLE_PLAN_HREF } from "@/seed/example-plan";

export const metadata: Metadata = { title: "Planner" };

type Search = Record<string, string | string[] | undefined>;

function toSearchParams(search: Search): URLSearchParams {
  const out = new URLSearchParams();
  for (const [k, v] of Object.entries(search)) {
    if (typeof v === "string") out.set(k, v);
    else if (Array.isArray(v) && v.length) out.set(k, v[0]);
  }
  return out;
}

export default async function PlanPage({ searchParams }: { searchParams: Promise<Search> }) {
  const params = toSearchParams(await searchParams);
  const user = await getSessionUser().catch(() => null);
  // Shop staff plan from their own shop's stock unless the link says otherwise.
  const initial = { ...parsePlanParams(params), ...(await defaultShopSource({ user, params })) };
  const answer = await firstAnswer({ state: initial, viewer: user });
  return (
    <>
      <PageTitle title="Planner"
        lead="Choose the optics, the devices and the camera. Trainyard mates every joint and lands the sensor at the back focus — the link in your address bar reproduces this plan." />
      {/* Keyed by the plan, so following a link to another plan starts from that link. */}
      {/* The left column's stops are h3s: this keeps the outline h1 → h2 → h3. */}
      <h2 className="sr-only">Your train and its answer</h2>
      <HydrationBoundary state={answer ?? undefined}>
        <PlanWorkbench key={planStateToParams(initial).toString()} initial={initial} signedIn={!!user} exampleHref={EXAMPLE_PLAN_HREF} />
      </HydrationBoundary>
    </>
  );
}
