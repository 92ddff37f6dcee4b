import "server-only";
import { and, asc, eq, gt, inArray, or, sql, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import { catalogState, parts } from "@/db/schema";
import { parseSearch } from "@/lib/search/normalize";
import { searchApprovedParts } from "./part-search";
import { AppError } from "@/lib/errors";
import { isUuid } from "@/lib/validation/ids";
import { hasNul } from "@/lib/validation/nul";
import { decodeCursor, encodeCursor, type ListPartsQuery } from "@/lib/validation/catalog";

/**
 * Approved parts, filtered. With a search: best match first (db/queries/part-search.ts),
 * paged by offset; without: keyset-paged by slug. Rows (with the search's match score, else
 * null) and the next page's cursor; lib/catalog/part-json.ts shapes them for the API.
 */
export async function listApprovedParts({ query }: { query: ListPartsQuery }) {
  const where: SQL[] = [];
  if (query.kind) where.push(eq(parts.kind, query.kind));
  if (query.interface) where.push(or(eq(parts.frontInterface, query.interface), eq(parts.rearInterface, query.interface))!);
  const search = query.q ? parseSearch(query.q) : null;
  const after = query.cursor ? decodeCursor(query.cursor) : null;
  if (query.cursor && after === null) throw new AppError("bad_request:validation", "Not a cursor from this API.", { cursor: ["Not a cursor from this API"] });
  if (search) {
    const offset = after?.startsWith("#") ? Number(after.slice(1)) || 0 : 0;
    const found = await searchApprovedParts({ search, where, limit: query.limit, offset });
    return { items: found.items, nextCursor: found.nextOffset === null ? null : encodeCursor(`#${found.nextOffset}`) };
  }
  where.push(eq(parts.status, "approved"));
  if (after && !after.startsWith("#")) where.push(gt(parts.slug, after));
  const rows = await db.select().from(parts).where(and(...where)).orderBy(asc(parts.slug)).limit(query.limit + 1);
  const page = rows.slice(0, query.limit);
  return {
    items: page.map((row) => ({ row, matchScore: null })),
    nextCursor: rows.length > query.limit ? encodeCursor(page[page.length - 1].slug) : null,
  };
}

/** By id or slug; pending and rejected parts only for their submitter or a moderator. */
export async function getPartOrThrow({ ref, viewer }: { ref: string; viewer?: { id: string; moderator: boolean } | null }) {
  if (hasNul(ref) || ref.length > 200) throw new AppError("not_found:part", "No such part in the catalog.");
  const [row] = await db.select().from(parts).where(isUuid(ref) ? or(eq(parts.id, ref), eq(parts.slug, ref)) : eq(parts.slug, ref)).limit(1);
  const visible = row && (row.status === "approved" || viewer?.moderator || (viewer && row.submittedBy === viewer.id));
  if (!row || !visible) throw new AppError("not_found:part", `No part "${ref}" in the catalog.`);
  return row;
}

/** Approved parts by ids or slugs, in one query. */
export async function getApprovedPartsByRefs({ refs }: { refs: string[] }) {
  if (!refs.length) return [];
  const ids = refs.filter(isUuid);
  const rows = await db.select().from(parts).where(and(eq(parts.status, "approved"),
    ids.length ? or(inArray(parts.slug, refs), inArray(parts.id, ids)) : inArray(parts.slug, refs)));
  return rows;
}

export async function listAllApprovedParts() {
  return db.select().from(parts).where(eq(parts.status, "approved")).orderBy(asc(parts.slug));
}

// Asked on every catalog plan (its cache key), so it is a named prepared statement: built once
// per process, parsed once per connection. Made on first use (`next build` has no database).
let catalogVersionQuery: { execute: () => Promise<{ version: number }[]> } | undefined;

export async function getCatalogVersion(): Promise<number> {
  catalogVersionQuery ??= db.select({ version: catalogState.version }).from(catalogState).where(eq(catalogState.id, 1)).prepare("catalog_version");
  const [row] = await catalogVersionQuery.execute();
  return row?.version ?? 0;
}

/** A moderator's correction to a catalog part; bumps the catalog version when it is approved. */
/**
 * A moderator's correction. `inSameTransaction` runs after the update of an approved part and
 * before the commit (the route queues the re-checks of builds that use the part there, so that
 * a crash can never leave the part changed and its re-checks unqueued).
 */
export async function updatePart({ slug, patch, inSameTransaction }: {
  slug: string; patch: import("@/lib/validation/submissions").PartPatch;
  inSameTransaction?: (tx: Tx, updated: typeof parts.$inferSelect) => Promise<void>;
}) {
  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(parts).where(eq(parts.slug, slug)).for("update");
    if (!row) throw new AppError("not_found:part", `No part "${slug}" in the catalog.`);
    const set: Partial<typeof parts.$inferInsert> = { updatedAt: new Date() };
    const { front, rear, specs, ...plain } = patch;
    Object.assign(set, plain);
    if (front !== undefined) { set.frontInterface = front?.interface ?? null; set.frontGender = front?.gender ?? null; }
    if (rear !== undefined) { set.rearInterface = rear?.interface ?? null; set.rearGender = rear?.gender ?? null; }
    if (specs) set.specs = { ...row.specs, ...specs };
    const [updated] = await tx.update(parts).set(set).where(eq(parts.id, row.id)).returning();
    if (row.status === "approved") {
      await bumpCatalogVersion(tx);
      await inSameTransaction?.(tx, updated);
    }
    return updated;
  });
}

type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

/** The solver's cache and the builds' re-check key on this: bump it whenever approved parts change. */
export async function bumpCatalogVersion(tx: Tx | typeof db = db) {
  await tx.insert(catalogState).values({ id: 1, version: 1 }).onConflictDoUpdate({
    target: catalogState.id, set: { version: sql`${catalogState.version} + 1`, updatedAt: new Date() },
  });
}
