import "server-only";
import { packCursor, unpackCursor } from "@/lib/validation/cursor";
import { and, asc, count, desc, eq, gt, gte, ilike, lt, ne, or } from "drizzle-orm";
import { db } from "@/db/client";
import { parts, user } from "@/db/schema";
import { bumpCatalogVersion } from "./parts";
import { partToRow } from "@/lib/catalog/rows";
import { AppError } from "@/lib/errors";
import { isUuid } from "@/lib/validation/ids";
import { slugify, type PartParsed } from "@/lib/validation/parts";

async function uniqueSlug(base: string): Promise<string> {
  for (let i = 0; i < 50; i++) {
    const slug = i === 0 ? base : `${base}-${i + 1}`;
    const [hit] = await db.select({ id: parts.id }).from(parts).where(eq(parts.slug, slug)).limit(1);
    if (!hit) return slug;
  }
  return `${base}-${crypto.randomUUID().slice(0, 8)}`;
}

/** A member's submission: stored as pending, flagged when maker + model already exist. */
export async function createSubmission({ input, userId, specSheet }: {
  input: PartParsed; userId: string; specSheet: { key: string; type: string } | null;
}) {
  const [dup] = await db.select({ id: parts.id, slug: parts.slug }).from(parts)
    .where(and(ilike(parts.maker, input.maker.trim()), ilike(parts.model, input.model.trim()), ne(parts.status, "rejected"))).limit(1);
  const slug = await uniqueSlug(input.slug ?? slugify(input.maker, input.model));
  const [row] = await db.insert(parts).values({
    ...partToRow(input), slug, status: "pending", submittedBy: userId,
    specSheetKey: specSheet?.key ?? null, specSheetType: specSheet?.type ?? null, probableDuplicateOf: dup?.slug ?? null,
  }).returning();
  return row;
}

type Page = { limit: number; cursor?: string };

// Keyset paging on (created_at, id): the cursor is the last row's pair, base64url-encoded.
function decodeCursor(cursor: string | undefined): { at: Date; id: string } | null {
  if (!cursor) return null;
  const [at, id, extra] = unpackCursor(cursor);
  if (!id || extra !== undefined || Number.isNaN(Date.parse(at)) || id.includes("\u0000")) throw new AppError("bad_request:validation", "Not a cursor from this API.", { cursor: ["Not a cursor from this API"] });
  return { at: new Date(at), id };
}
const encodeCursor = (row: { createdAt: Date; id: string }) => packCursor(row.createdAt.toISOString(), row.id);

function pageOf<T>(rows: T[], limit: number, key: (r: T) => { createdAt: Date; id: string }) {
  const items = rows.slice(0, limit);
  return { items, nextCursor: rows.length > limit ? encodeCursor(key(items[items.length - 1])) : null };
}

/** The moderators' queue, oldest first. */
export async function listPendingSubmissions({ limit, cursor }: Page = { limit: 100 }) {
  const after = decodeCursor(cursor);
  const rows = await db.select({ part: parts, submitter: { name: user.name, email: user.email } }).from(parts)
    .leftJoin(user, eq(user.id, parts.submittedBy))
    .where(and(eq(parts.status, "pending"), after ? or(gt(parts.createdAt, after.at), and(eq(parts.createdAt, after.at), gt(parts.id, after.id))) : undefined))
    .orderBy(asc(parts.createdAt), asc(parts.id)).limit(limit + 1);
  return pageOf(rows, limit, (r) => r.part);
}

/** A member's own submissions, newest first. */
export async function listSubmissionsBy({ userId, limit, cursor }: { userId: string } & Page) {
  const before = decodeCursor(cursor);
  const rows = await db.select().from(parts)
    .where(and(eq(parts.submittedBy, userId), before ? or(lt(parts.createdAt, before.at), and(eq(parts.createdAt, before.at), lt(parts.id, before.id))) : undefined))
    .orderBy(desc(parts.createdAt), desc(parts.id)).limit(limit + 1);
  return pageOf(rows, limit, (r) => r);
}

/** How many parts a member submitted since `since` (the upload quota). */
export async function countSubmissionsSince({ userId, since }: { userId: string; since: Date }): Promise<number> {
  const [row] = await db.select({ n: count() }).from(parts).where(and(eq(parts.submittedBy, userId), gte(parts.createdAt, since)));
  return row?.n ?? 0;
}

export async function getSubmissionOrThrow({ id }: { id: string }) {
  if (!isUuid(id)) throw new AppError("not_found:submission", "No such submission.");
  const [row] = await db.select({ part: parts, submitterEmail: user.email, submitterName: user.name }).from(parts)
    .leftJoin(user, eq(user.id, parts.submittedBy)).where(eq(parts.id, id)).limit(1);
  if (!row) throw new AppError("not_found:submission", "No such submission.");
  return row;
}

/** Approve or reject a pending part in one transaction; approval bumps the catalog version. */
export async function reviewSubmission({ id, reviewerId, decision, reason }: {
  id: string; reviewerId: string; decision: "approve" | "reject"; reason?: string;
}) {
  if (!isUuid(id)) throw new AppError("not_found:submission", "No such submission.");
  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(parts).where(eq(parts.id, id)).for("update");
    if (!row) throw new AppError("not_found:submission", "No such submission.");
    if (row.status !== "pending") throw new AppError("conflict:submission", `This submission was already ${row.status}.`);
    const [updated] = await tx.update(parts).set({
      status: decision === "approve" ? "approved" : "rejected", reviewedBy: reviewerId, reviewReason: reason ?? null,
      reviewedAt: new Date(), updatedAt: new Date(),
    }).where(eq(parts.id, id)).returning();
    if (decision === "approve") await bumpCatalogVersion(tx);
    return updated;
  });
}
