import "server-only";
import { and, arrayOverlaps, asc, count, desc, eq, ilike, isNotNull, isNull, ne, or, sql, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "@/db/client";
import { escapeLike } from "@/db/queries/like";
import { buildAudit, buildThreads, builds, user, type BuildRow } from "@/db/schema";
import { isModeratorRole, type BuildViewer } from "@/lib/builds/access";
import { newBuildSlug } from "@/lib/builds/slug";
import { AppError } from "@/lib/errors";
import { packCursor } from "@/lib/validation/cursor";
import { buildSlugSchema, decodeBuildCursor, MAX_THREADS_PER_BUILD, type ListBuildsQuery, type UpdateBuildInput } from "@/lib/validation/builds";

export type NewBuild = Pick<BuildRow, "title" | "notes" | "visibility" | "request" | "solutionIndex" | "result" | "partIds" | "checkedCatalogVersion">;
const endorser = alias(user, "endorser");
const endorsedSql = sql<number>`(case when ${builds.endorsedAt} is null then 0 else 1 end)`;

/** Rows a viewer may open: their own, or listed ones that are not hidden; moderators see all. */
function visibleTo(viewer: BuildViewer): SQL | undefined {
  if (isModeratorRole(viewer)) return undefined;
  const open = and(ne(builds.visibility, "private"), isNull(builds.hiddenAt));
  return viewer ? or(eq(builds.ownerId, viewer.id), open) : open;
}

export async function insertBuild({ ownerId, values }: { ownerId: string; values: NewBuild }): Promise<string> {
  for (let attempt = 0; attempt < 5; attempt++) {
    const slug = newBuildSlug();
    const [row] = await db.insert(builds).values({ ...values, slug, ownerId }).onConflictDoNothing({ target: builds.slug }).returning({ slug: builds.slug });
    if (row) return row.slug;
  }
  throw new AppError("internal", "Could not find a free link for the build; please try again.");
}

/** One build with its owner's and endorser's names; 404 when the viewer may not see it. */
export async function getBuildOrThrow({ slug, viewer }: { slug: string; viewer: BuildViewer }) {
  if (!buildSlugSchema.safeParse(slug).success) throw new AppError("not_found:build", "No build at this link (it may be private, hidden or deleted).");
  const [row] = await db.select({ build: builds, ownerName: user.name, endorserName: endorser.name }).from(builds)
    .innerJoin(user, eq(user.id, builds.ownerId))
    .leftJoin(endorser, eq(endorser.id, builds.endorsedBy))
    .where(and(eq(builds.slug, slug), visibleTo(viewer))).limit(1);
  if (!row) throw new AppError("not_found:build", "No build at this link (it may be private, hidden or deleted).");
  return row;
}

export async function listBuildThreads({ buildId }: { buildId: string }) {
  return db.select({ url: buildThreads.url, createdAt: buildThreads.createdAt }).from(buildThreads)
    .where(eq(buildThreads.buildId, buildId)).orderBy(asc(buildThreads.createdAt));
}

export async function listBuildAudit({ buildId }: { buildId: string }) {
  return db.select({ action: buildAudit.action, detail: buildAudit.detail, createdAt: buildAudit.createdAt, actorName: user.name })
    .from(buildAudit).leftJoin(user, eq(user.id, buildAudit.actorId))
    .where(eq(buildAudit.buildId, buildId)).orderBy(desc(buildAudit.createdAt)).limit(200);
}

/** Title, notes and visibility only, and only by the owner. */
export async function updateOwnBuild({ buildId, ownerId, patch }: { buildId: string; ownerId: string; patch: UpdateBuildInput }) {
  const [row] = await db.update(builds).set({ ...patch, updatedAt: new Date() })
    .where(and(eq(builds.id, buildId), eq(builds.ownerId, ownerId))).returning();
  if (!row) throw new AppError("not_found:build", "No build of yours at this link.");
  return row;
}

/** By the owner, or by an admin (whose deletion is no one's to undo: callers check the role). */
/** Passed as `ownerId` when an admin deletes someone else's build: no owner condition. */
export const ANY_OWNER = Symbol("any owner");

export async function deleteBuild({ buildId, ownerId }: { buildId: string; ownerId: string | typeof ANY_OWNER }) {
  const where = ownerId === ANY_OWNER ? eq(builds.id, buildId) : and(eq(builds.id, buildId), eq(builds.ownerId, ownerId));
  const rows = await db.delete(builds).where(where).returning({ id: builds.id });
  if (!rows.length) throw new AppError("not_found:build", "No build of yours at this link.");
}

async function audit(tx: Pick<typeof db, "insert">, buildId: string, actorId: string | null, action: string, detail: Record<string, unknown> | null = null) {
  await tx.insert(buildAudit).values({ buildId, actorId, action, detail });
}

/** Endorse (or withdraw); audited only when the state changes. Returns the new endorsement time. */
export async function setBuildEndorsed({ buildId, actorId, endorsed }: { buildId: string; actorId: string; endorsed: boolean }) {
  return db.transaction(async (tx) => {
    const [current] = await tx.select({ endorsedAt: builds.endorsedAt }).from(builds).where(eq(builds.id, buildId)).for("update");
    if (!current) throw new AppError("not_found:build", "No build at this link.");
    if (!!current.endorsedAt === endorsed) return current.endorsedAt;
    const endorsedAt = endorsed ? new Date() : null;
    await tx.update(builds).set({ endorsedAt, endorsedBy: endorsed ? actorId : null }).where(eq(builds.id, buildId));
    await audit(tx, buildId, actorId, endorsed ? "endorse" : "withdraw");
    return endorsedAt;
  });
}

export async function setBuildHidden({ buildId, actorId, reason }: { buildId: string; actorId: string; reason: string | null }) {
  await db.transaction(async (tx) => {
    const [current] = await tx.select({ hiddenAt: builds.hiddenAt, hiddenReason: builds.hiddenReason }).from(builds).where(eq(builds.id, buildId)).for("update");
    if (!current) throw new AppError("not_found:build", "No build at this link.");
    if (reason === null && !current.hiddenAt) return;
    if (reason !== null && current.hiddenAt && current.hiddenReason === reason) return;
    await tx.update(builds).set({ hiddenAt: reason === null ? null : new Date(), hiddenReason: reason }).where(eq(builds.id, buildId));
    await audit(tx, buildId, actorId, reason === null ? "unhide" : "hide", reason === null ? null : { reason });
  });
}

export async function addBuildThread({ buildId, actorId, url }: { buildId: string; actorId: string; url: string }) {
  await db.transaction(async (tx) => {
    await tx.select({ id: builds.id }).from(builds).where(eq(builds.id, buildId)).for("update");
    const [{ n }] = await tx.select({ n: count() }).from(buildThreads).where(eq(buildThreads.buildId, buildId));
    if (n >= MAX_THREADS_PER_BUILD) throw new AppError("conflict:threads", `A build holds at most ${MAX_THREADS_PER_BUILD} thread links.`, { url: [`At most ${MAX_THREADS_PER_BUILD} threads`] });
    const added = await tx.insert(buildThreads).values({ buildId, url, addedBy: actorId }).onConflictDoNothing().returning({ id: buildThreads.id });
    if (added.length) await audit(tx, buildId, actorId, "thread-add", { url });
  });
}

export async function removeBuildThread({ buildId, actorId, url }: { buildId: string; actorId: string; url: string }) {
  await db.transaction(async (tx) => {
    const gone = await tx.delete(buildThreads).where(and(eq(buildThreads.buildId, buildId), eq(buildThreads.url, url))).returning({ id: buildThreads.id });
    if (!gone.length) throw new AppError("not_found:thread", "That thread is not attached to this build.");
    await audit(tx, buildId, actorId, "thread-remove", { url });
  });
}

export async function recordOwnerEdit({ buildId, actorId, fields }: { buildId: string; actorId: string; fields: string[] }) {
  await audit(db, buildId, actorId, "owner-edit", { fields });
}

const listColumns = {
  slug: builds.slug, title: builds.title, visibility: builds.visibility, result: builds.result, solutionIndex: builds.solutionIndex,
  endorsedAt: builds.endorsedAt, fits: builds.fits, checkReason: builds.checkReason, hiddenAt: builds.hiddenAt,
  createdAt: builds.createdAt, ownerName: user.name,
  // Full-precision keyset position (JS Dates stop at milliseconds).
  position: sql<string>`${endorsedSql} || ',' || to_char(${builds.createdAt} at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.US"Z"') || ',' || ${builds.id}`,
};

/** Public builds (or all of the viewer's with `mine`), reference builds first, newest next. */
export async function listBuilds({ query, ownerId }: { query: ListBuildsQuery; ownerId: string | null }) {
  const where: (SQL | undefined)[] = query.mine && ownerId
    ? [eq(builds.ownerId, ownerId)]
    : [eq(builds.visibility, "public"), isNull(builds.hiddenAt)];
  if (query.reference) where.push(isNotNull(builds.endorsedAt));
  for (const word of (query.q ?? "").split(/\s+/).filter(Boolean).slice(0, 6)) {
    const like = `%${escapeLike(word)}%`;
    const slugLike = `%${escapeLike(word.toLowerCase())}%`;
    where.push(or(ilike(builds.title, like), ilike(builds.notes, like), sql`array_to_string(${builds.partIds}, ' ') like ${slugLike}`));
  }
  if (query.cursor) {
    const c = decodeBuildCursor(query.cursor);
    if (!c) throw new AppError("bad_request:validation", "Not a cursor from this API.", { cursor: ["Not a cursor from this API"] });
    where.push(sql`(${endorsedSql}, ${builds.createdAt}, ${builds.id}) < (${c.endorsed}, ${c.at}::timestamptz, ${c.id})`);
  }
  const rows = await db.select(listColumns).from(builds).innerJoin(user, eq(user.id, builds.ownerId))
    .where(and(...where)).orderBy(desc(endorsedSql), desc(builds.createdAt), desc(builds.id)).limit(query.limit + 1);
  const page = rows.slice(0, query.limit);
  const last = page[page.length - 1];
  return { items: page, nextCursor: rows.length > query.limit && last ? packCursor(last.position) : null };
}

/** The moderators' queue: endorsed builds that stopped fitting first, then the newest that others can see. */
export async function listReviewQueue({ limit = 50 }: { limit?: number } = {}) {
  const flagged = await db.select(listColumns).from(builds).innerJoin(user, eq(user.id, builds.ownerId))
    .where(and(isNotNull(builds.endorsedAt), eq(builds.fits, false))).orderBy(desc(builds.checkedAt)).limit(limit);
  const recent = await db.select(listColumns).from(builds).innerJoin(user, eq(user.id, builds.ownerId))
    .where(and(ne(builds.visibility, "private"), or(isNull(builds.endorsedAt), eq(builds.fits, true))))
    .orderBy(desc(builds.createdAt)).limit(limit);
  return { flagged, recent };
}

/** Builds that use any of these catalog slugs (the re-check's work list). */
export async function listBuildsUsingParts({ slugs, tx = db }: { slugs: string[]; tx?: Pick<typeof db, "select" | "execute"> }) {
  if (!slugs.length) return [];
  return tx.select().from(builds).where(arrayOverlaps(builds.partIds, slugs)).orderBy(asc(builds.createdAt));
}

/** Store a re-check verdict; audit it when the verdict flips. */
export async function recordBuildCheck({ buildId, fits, reason, catalogVersion, flipped }: {
  buildId: string; fits: boolean; reason: string | null; catalogVersion: number | null; flipped: boolean;
}) {
  await db.transaction(async (tx) => {
    await tx.update(builds).set({ fits, checkReason: reason, checkedAt: new Date(), checkedCatalogVersion: catalogVersion }).where(eq(builds.id, buildId));
    if (flipped) await audit(tx, buildId, null, "recheck", { fits, reason });
  });
}

export async function getBuildById({ id }: { id: string }) {
  const [row] = await db.select().from(builds).where(eq(builds.id, id)).limit(1);
  return row ?? null;
}
