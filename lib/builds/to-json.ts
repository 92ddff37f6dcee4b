// The public JSON of a build (GET /api/v1/builds/[slug]) and of a list entry.
import type { BuildRow } from "@/db/schema";
import type { PlanResponse } from "@/lib/planner/api-types";
import { chosenChain, itemOf } from "./chain";
import { buildImageUrl, buildUrl } from "./site-url";

type AuditEntry = { action: string; detail: unknown; createdAt: Date; actorName: string | null };

export function buildToJson({ build, ownerName, endorserName, threads, audit, origin }: {
  build: BuildRow; ownerName: string; endorserName: string | null; origin: string;
  threads: { url: string; createdAt: Date }[]; audit?: AuditEntry[];
}) {
  const result = build.result as PlanResponse;
  return {
    slug: build.slug,
    url: buildUrl(origin, build.slug),
    imageUrl: buildImageUrl(origin, build.slug),
    title: build.title,
    notes: build.notes,
    visibility: build.visibility,
    owner: { name: ownerName },
    createdAt: build.createdAt,
    updatedAt: build.updatedAt,
    request: build.request,
    solutionIndex: build.solutionIndex,
    result,
    chain: chosenChain(result, build.solutionIndex),
    partIds: build.partIds,
    endorsed: !!build.endorsedAt,
    endorsedAt: build.endorsedAt,
    endorsedBy: build.endorsedAt ? { name: endorserName } : null,
    fits: build.fits,
    checkReason: build.checkReason,
    checkedAt: build.checkedAt,
    hidden: !!build.hiddenAt,
    hiddenReason: build.hiddenAt ? build.hiddenReason : null,
    threads: threads.map((t) => ({ url: t.url, createdAt: t.createdAt })),
    ...(audit ? { audit: audit.map((a) => ({ action: a.action, detail: a.detail, createdAt: a.createdAt, actor: a.actorName ? { name: a.actorName } : null })) } : {}),
  };
}

export type BuildListRow = {
  slug: string; title: string; visibility: string; result: unknown; solutionIndex: number; endorsedAt: Date | null;
  fits: boolean; checkReason: string | null; hiddenAt: Date | null; createdAt: Date; ownerName: string;
};

/** A list entry: enough to recognise the train without its full result. */
export function buildSummary(row: BuildListRow, origin: string) {
  const result = row.result as PlanResponse;
  const chain = chosenChain(result, row.solutionIndex);
  const ctx = result.context;
  return {
    slug: row.slug, url: buildUrl(origin, row.slug), imageUrl: buildImageUrl(origin, row.slug), title: row.title,
    visibility: row.visibility, owner: { name: row.ownerName }, createdAt: row.createdAt,
    endorsed: !!row.endorsedAt, fits: row.fits, checkReason: row.checkReason, hidden: !!row.hiddenAt,
    optics: itemOf(result, ctx.opticsId).name,
    telescope: ctx.telescopeId ? itemOf(result, ctx.telescopeId).name : null,
    camera: itemOf(result, ctx.cameraId).name,
    stations: ctx.stationIds.map((id) => itemOf(result, id).name),
    sensorDistanceMm: chain?.sensorDistanceMm ?? null,
    targetMm: result.targetMm,
    toleranceMm: result.toleranceMm,
    errorMm: chain?.errorMm ?? null,
    partCount: chain?.partCount ?? null,
    priceCents: chain?.priceCents ?? null,
  };
}
export type BuildSummary = ReturnType<typeof buildSummary>;
