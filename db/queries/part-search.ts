import "server-only";
import { and, eq, or, sql, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import { escapeLike } from "@/db/queries/like";
import { parts } from "@/db/schema";
import { nameCompactSql, searchCompactSql, searchWordsSql } from "@/db/search-sql";
import type { ParsedSearch } from "@/lib/search/normalize";

/** The query as a prefix tsquery: words AND-ed, a synonym's spellings OR-ed, phrases in order. */
export function toTsQuery(search: ParsedSearch): string {
  const phrase = (s: string) => s.split(" ").map((w) => `${w}:*`).join(" <-> ");
  return search.groups.map((g) => `(${(g.synonyms ?? [g.word]).map(phrase).join(" | ")})`).join(" & ");
}

/**
 * Approved parts that match every word of the search (or a trade synonym of it), best match
 * first: a name that holds the whole query, then one that ends with it, then trigram
 * similarity and full-text rank. The word tests use the trigram indexes on the normalised
 * words (LIKE and regular expressions both can). Paged by offset, since the order is by score.
 * Rows with their score; lib/catalog/part-json.ts shapes them for the API.
 */
export async function searchApprovedParts({ search, where, limit, offset }: { search: ParsedSearch; where: SQL[]; limit: number; offset: number }) {
  const words = searchWordsSql(parts);
  const compactWords = searchCompactSql(parts);
  const tsv = sql`to_tsvector('simple', ${words})`;
  const tsq = sql`to_tsquery('simple', ${toTsQuery(search)})`;
  const groups = search.groups.map((g) => g.synonyms
    ? sql`${words} ~ ${`\\m(${g.synonyms.join("|")})\\M${g.notBefore ? `(?!${g.notBefore})` : ""}`}`
    : g.word.length >= 4
      ? or(sql`${compactWords} like ${`%${escapeLike(g.word)}%`}`, sql`${g.word} <% ${words}`)!
      : sql`${compactWords} like ${`%${escapeLike(g.word)}%`}`);
  const name = nameCompactSql(parts);
  const whole = `%${escapeLike(search.compact)}`;
  const score = sql<number>`(4 * (${name} like ${`${whole}%`})::int + 2 * (${name} like ${whole})::int
    + similarity(${words}, ${search.words}) + ts_rank(${tsv}, ${tsq}))::float8`;
  const rows = await db.select({ part: parts, score }).from(parts)
    .where(and(eq(parts.status, "approved"), ...where, ...groups))
    .orderBy(sql`${score} desc`, parts.slug)
    .limit(limit + 1).offset(offset);
  const page = rows.slice(0, limit);
  return {
    items: page.map((r) => ({ row: r.part, matchScore: r.score })),
    nextOffset: rows.length > limit ? offset + limit : null,
  };
}
