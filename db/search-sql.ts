// The catalog side of part search, as SQL that both the indexes (db/schema.ts) and the
// queries (db/queries/parts.ts) use, so PostgreSQL can answer from the indexes. It must stay
// in step with normalizeWords in lib/search/normalize.ts (a unit test compares the two).
import { sql, type AnyColumn, type SQL } from "drizzle-orm";

type SearchColumns = { maker: AnyColumn; model: AnyColumn; kind: AnyColumn; frontInterface: AnyColumn; rearInterface: AnyColumn; specs: AnyColumn };

/** Normalise any text expression the way normalizeWords does. */
export function normalizedSql(text: SQL): SQL {
  return sql`btrim(regexp_replace(replace(regexp_replace(lower(${text}), '([0-9])\\s*[x×*]\\s*(?=[0-9])', '\\1 ', 'g'), '.', ''), '[^a-z0-9]+', ' ', 'g'))`;
}

/** Maker, model, kind, optics role and both faces' codes: what a search may name. */
export function searchWordsSql(t: SearchColumns): SQL {
  return normalizedSql(sql`${t.maker} || ' ' || ${t.model} || ' ' || ${t.kind} || ' ' || coalesce(${t.specs} ->> 'opticsRole', '') || ' ' || coalesce(${t.frontInterface}, '') || ' ' || coalesce(${t.rearInterface}, '')`);
}

/** The same words with the spaces taken out, so "80ed" finds "80 ED". */
export function searchCompactSql(t: SearchColumns): SQL {
  return sql`replace(${searchWordsSql(t)}, ' ', '')`;
}

/** Maker and model only: ranks a part whose name holds the whole query first. */
export function nameCompactSql(t: Pick<SearchColumns, "maker" | "model">): SQL {
  return sql`replace(${normalizedSql(sql`${t.maker} || ' ' || ${t.model}`)}, ' ', '')`;
}
