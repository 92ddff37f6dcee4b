// How a catalog search is read: imagers type "80ed", "carousel 7 x 2in", "T-thread" or
// "2 inch" for what the catalog spells "80 ED", "Carousel 7 × 2in", "M42x0.75" and "2in".
// Both sides go through the same normalisation (here for the query, in db/search-sql.ts for
// the catalog, which must stay in step with normalizeWords), then each query word must be
// found, or one of its trade synonyms. Pure: no database or framework imports.

/**
 * Lower case; "7 × 2" and "M42x0.75" become "7 2" and "m42 075"; dots vanish ("50.8" → "508",
 * "1.25in" → "125in"); any other punctuation is a space.
 */
export function normalizeWords(s: string): string {
  return s.toLowerCase()
    .replace(/([0-9])\s*[x×*]\s*(?=[0-9])/g, "$1 ")
    .replace(/\./g, "")
    .replace(/[^a-z0-9]+/g, " ")
    .trim();
}

export const compact = (words: string) => words.replace(/ /g, "");

/**
 * Trade synonyms (common practice in the hobby's vocabulary). Each entry: the phrases a person
 * may type (normalised words, matched whole) and the spellings the catalog may use for it.
 */
const SYNONYMS: { typed: RegExp; canonical: string; catalog: string[]; notBefore?: string }[] = [
  { typed: /\b(off ?axis guiders?|oags?|guiders?|guide port)\b/g, canonical: "guider", catalog: ["oag", "guider", "off axis"] },
  { typed: /\b(t ?threads?|t ?2|t ?mount|m ?42 075)\b/g, canonical: "tthread", catalog: ["m42 075", "t thread", "t2"] },
  { typed: /\b(2 ?(inch|inches|in)|508 ?mm)\b/g, canonical: "2in", catalog: ["2in", "2 inch", "508 mm", "508mm"], notBefore: " 24tpi" },
  { typed: /\b(125 ?(inch|inches|in)|3175 ?mm)\b/g, canonical: "125in", catalog: ["125in", "125 inch", "3175 mm"] },
  { typed: /\b(sct|schmidt cassegrain|2 24( ?tpi)?|2in 24 ?tpi)\b/g, canonical: "sct", catalog: ["2in 24tpi", "sct", "schmidt"] },
  { typed: /\b(field )?flatteners?\b/g, canonical: "flattener", catalog: ["flattener"] },
  { typed: /\b(focal )?reducers?\b/g, canonical: "reducer", catalog: ["reducer"] },
  { typed: /\b(filter )?wheels?\b/g, canonical: "wheel", catalog: ["wheel"] },
];
const BY_CANONICAL = new Map(SYNONYMS.map((s) => [s.canonical, s]));

/**
 * One word of the query: plain words match anywhere (spacing ignored); synonyms match one of
 * the catalog's spellings as whole words, not followed by `notBefore` (the "2in" of the SCT
 * thread code "2in-24tpi" is not a 2-inch barrel).
 */
export type SearchGroup = { word: string; synonyms: string[] | null; notBefore?: string };

export type ParsedSearch = {
  /** The query's words after synonyms, every one required. */
  groups: SearchGroup[];
  /** The normalised query, spaces kept (for similarity) and dropped (for "contains it all"). */
  words: string;
  compact: string;
};

const NOISE = new Set(["x", "and", "the", "with", "for", "mm"]);

export function parseSearch(q: string): ParsedSearch | null {
  const words = normalizeWords(q);
  if (!words) return null;
  let canon = ` ${words} `;
  for (const s of SYNONYMS) canon = canon.replace(s.typed, ` ${s.canonical} `);
  // A metric thread ("m48 075", "m42 1") is one word: its pitch alone would match anything.
  canon = canon.replace(/\bm ?([0-9]{2,3}) ([0-9]{1,3})\b/g, " m$1_$2 ");
  const tokens = [...new Set(canon.split(" ").filter((w) => w && !NOISE.has(w)))].slice(0, 8);
  const groups = tokens.map((word) => {
    if (word.includes("_")) return { word, synonyms: [word.replace("_", " ")] };
    const syn = BY_CANONICAL.get(word);
    return syn ? { word, synonyms: syn.catalog, ...(syn.notBefore ? { notBefore: syn.notBefore } : {}) } : { word, synonyms: null };
  });
  if (!groups.length) return null;
  return { groups, words, compact: compact(words) };
}
