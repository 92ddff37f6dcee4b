import "server-only";
import { listBuildsUsingParts, recordBuildCheck } from "@/db/queries/builds";
import { getApprovedPartsByRefs } from "@/db/queries/parts";
import type { BuildRow, PartRow } from "@/db/schema";
import type { SessionUser } from "@/lib/auth/session";
import { rowToSolverPart } from "@/lib/catalog/to-solver";
import { AppError } from "@/lib/errors";
import { enqueueRechecks } from "@/lib/jobs/queue";
import type { PlanResponse } from "@/lib/planner/api-types";
import { runPlan, type PlanInput } from "@/lib/planner/run-plan";
import type { Chain, Part } from "@/lib/solver/types";
import { chosenChain, chosenTelescopeLink, connectorKey, itemOf, stripOwned } from "./chain";

type Verdict = { fits: boolean; reason: string; catalogVersion: number | null };
const mm = (v: number) => `${v.toFixed(1)} mm`;
const window = (r: { targetMm: number | null; toleranceMm: number | null }) =>
  r.targetMm === null ? "no back focus" : `${r.targetMm.toFixed(2)} ± ${(r.toleranceMm ?? 0.5).toFixed(2)} mm`;

/** What changed in the parts of the saved chain, in words ("M48 spacer 15 mm: 15.0 → 21.0 mm long"). */
function describeChanges(saved: PlanResponse, now: PlanResponse, chain: Chain, rows: Map<string, PartRow>): string[] {
  const out: string[] = [];
  for (const id of new Set(chain.steps.map((s) => s.partId))) {
    const before = itemOf(saved, id);
    const row = rows.get(stripOwned(id));
    const after = now.context.items[id] ?? (row ? { lengthMm: row.lengthMm, front: row.frontInterface ? { interface: row.frontInterface, gender: row.frontGender } : null, rear: row.rearInterface ? { interface: row.rearInterface, gender: row.rearGender } : null } : null);
    if (!after) continue;
    if (Math.abs(after.lengthMm - before.lengthMm) > 1e-9) out.push(`${before.name}: ${mm(before.lengthMm)} → ${mm(after.lengthMm)} long`);
    for (const side of ["front", "rear"] as const) {
      const b = before[side], a = after[side];
      if ((b?.interface ?? null) !== (a?.interface ?? null) || (b?.gender ?? null) !== (a?.gender ?? null)) {
        out.push(`${before.name}: ${side === "front" ? "sky" : "sensor"} side now ${a ? `${a.interface} ${a.gender}` : "closed"}`);
      }
    }
  }
  return out;
}

/** Where the saved steps land with today's catalog lengths (adjustable parts keep their setting when they can). */
function landingNow(chain: Chain, now: PlanResponse, rows: Map<string, PartRow>): number {
  let d = 0;
  for (const s of chain.steps) {
    const row = rows.get(stripOwned(s.partId));
    const item = now.context.items[s.partId];
    const base = item?.lengthMm ?? row?.lengthMm ?? s.lengthMm;
    const adjust = item?.adjustMm ?? row?.adjustMm ?? 0;
    d += Math.min(base + adjust, Math.max(base, s.lengthMm));
  }
  return d;
}

/** Re-solve one build against today's catalog: does its saved chain still land in the window? */
export async function checkBuild(build: BuildRow): Promise<Verdict> {
  const saved = build.result as PlanResponse;
  const chain = chosenChain(saved, build.solutionIndex);
  if (!chain) return { fits: false, reason: "The saved result has no chain to check.", catalogVersion: null };
  const request = build.request as PlanInput;
  const connectorIds = chain.steps.filter((s) => s.role === "connector").map((s) => s.partId);
  const linkIds = (chosenTelescopeLink(saved)?.steps ?? []).map((s) => s.partId);
  const rows = new Map((await getApprovedPartsByRefs({ refs: [...new Set([...chain.steps.map((s) => s.partId), ...linkIds].map(stripOwned))] })).map((r) => [r.slug, r]));

  const counts = new Map<string, number>();
  for (const id of connectorIds) counts.set(id, (counts.get(id) ?? 0) + 1);
  // The telescope → corrector link's adapters too: without them the plan would not join (join-plan.ts).
  // Each link is solved on its own, so a part needs as many as the link that uses it most.
  const inLink = new Map<string, number>();
  for (const s of chosenTelescopeLink(saved)?.steps ?? []) if (s.role === "connector") inLink.set(s.partId, (inLink.get(s.partId) ?? 0) + 1);
  for (const [id, n] of inLink) counts.set(id, Math.max(counts.get(id) ?? 0, n));
  const parts: Part[] = [];
  for (const [id, quantity] of counts) {
    const row = rows.get(stripOwned(id));
    const inline = request.parts?.find((p) => p.id === id);
    if (row) parts.push(rowToSolverPart(row, { owned: id.endsWith("~owned"), quantity }));
    else if (inline) parts.push({ ...inline, quantity });
    else return { fits: false, reason: `${itemOf(saved, id).name} is no longer in the catalog.`, catalogVersion: null };
  }

  // The saved chain's own parts only: "still fits" means this multiset still lands in the window.
  let now: PlanResponse;
  try {
    const r = await runPlan({ input: { ...request, source: undefined, parts, maxParts: Math.max(1, connectorIds.length), maxSolutions: 50 }, viewer: null });
    if (!("context" in r)) throw new AppError("internal", "The saved plan no longer names catalog parts.");
    now = r;
  } catch (err) {
    if (err instanceof AppError && err.status < 500) return { fits: false, reason: err.message, catalogVersion: null };
    throw err;
  }
  const key = connectorKey(chain);
  const same = now.solutions.find((c) => connectorKey(c) === key);
  if (same) return { fits: true, reason: `The saved chain lands at ${mm(same.sensorDistanceMm)}, inside ${window(now)}.`, catalogVersion: now.context.catalogVersion };

  const changes = describeChanges(saved, now, chain, rows);
  const changed = changes.length ? ` Changed: ${changes.join("; ")}.` : "";
  if (now.status === "no-connection") {
    return { fits: false, reason: `A joint of the saved chain no longer mates${now.reason ? `: ${now.reason}` : "."}${changed}`, catalogVersion: now.context.catalogVersion };
  }
  const d = landingNow(chain, now, rows);
  const off = now.targetMm === null ? "" : ` (${mm(Math.abs(d - now.targetMm))} too ${d > now.targetMm ? "long" : "short"})`;
  return {
    fits: false,
    reason: `The saved chain now lands at ${mm(d)}, outside ${window(now)}${off}.${changed}`,
    catalogVersion: now.context.catalogVersion,
  };
}

/** Owned parts are planned for their owner: re-solve as them (only their id is read). */
const ownerAsViewer = (ownerId: string): SessionUser => ({ id: ownerId, email: "", name: "", role: "member", emailVerified: true });

/** When the saved chain no longer fits, say whether the catalog offers another that does. */
async function alternativeHint(build: BuildRow): Promise<string> {
  try {
    const r = await runPlan({ input: build.request as PlanInput, viewer: ownerAsViewer(build.ownerId) });
    if (r.solutions.length) return ` The catalog offers ${r.solutions.length === 1 ? "another chain that fits" : `${r.solutions.length} other chains that fit`}: open the build in the planner to choose one.`;
    return r.reason ? ` Nothing in the catalog fits now: ${r.reason}` : "";
  } catch {
    return "";
  }
}

/**
 * Re-solve one build against today's catalog, store the verdict, and audit it when it flipped.
 * Run by the job worker; an error is thrown so the queue retries it.
 */
export async function recheckBuild(build: BuildRow): Promise<Verdict> {
  const verdict = await checkBuild(build);
  if (!verdict.fits) verdict.reason += await alternativeHint(build);
  await recordBuildCheck({
    buildId: build.id, fits: verdict.fits, reason: verdict.reason,
    catalogVersion: verdict.catalogVersion ?? build.checkedCatalogVersion, flipped: verdict.fits !== build.fits,
  });
  return verdict;
}

/**
 * After a catalog part changes: queue a durable re-check of every build that uses it — inside
 * the transaction that changed the part when one is given.
 */
export async function recheckBuildsForParts({ slugs, tx }: { slugs: string[]; tx?: Parameters<typeof listBuildsUsingParts>[0]["tx"] }): Promise<{ queued: number }> {
  const list = await listBuildsUsingParts({ slugs: [...new Set(slugs)], tx });
  return { queued: await enqueueRechecks(list.map((b) => b.id), tx) };
}
