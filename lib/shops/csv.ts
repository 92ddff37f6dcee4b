// Inventory CSV: parse and check an upload into a preview (nothing is written here), and
// write the shop's stock back out with formula-looking cells neutralised. Pure: no database.
import Papa from "papaparse";
import { inventoryItemSchema, LIMITS } from "@/lib/validation/shops";

export const CSV_COLUMNS = ["catalog_slug", "maker", "model", "sku", "price_cents", "currency", "on_hand"] as const;
const REQUIRED = ["sku", "price_cents", "currency", "on_hand"] as const;

export type CatalogLookup = {
  bySlug: Map<string, { id: string; slug: string; name: string }>;
  /** Key: `${maker}\u0000${model}`, lower case. */
  byMakerModel: Map<string, { id: string; slug: string; name: string }>;
};
export type CurrentStock = Map<string, { sku: string; reserved: number }>; // by part id

export type PreviewRow = {
  line: number;
  sku: string;
  part: { id: string; slug: string; name: string } | null;
  priceCents: number | null;
  currency: string;
  onHand: number | null;
  action: "add" | "update" | null;
  errors: string[];
};
export type Preview = { rows: PreviewRow[]; errors: string[]; okCount: number; errorCount: number };

export const makerModelKey = (maker: string, model: string) => `${maker.trim().toLowerCase()}\u0000${model.trim().toLowerCase()}`;

function wholeNumber(raw: string): number | null {
  const t = raw.trim();
  return /^-?\d+$/.test(t) ? Number(t) : /^-?\d*\.\d+$/.test(t) ? Number(t) : t === "" ? null : Number.NaN;
}

/** Whole-file problems (wrong columns, not CSV) come back in `errors`; row problems on each row. */
export function previewInventoryCsv(text: string, catalog: CatalogLookup, current: CurrentStock): Preview {
  const empty = (msg: string): Preview => ({ rows: [], errors: [msg], okCount: 0, errorCount: 0 });
  if (text.includes("\u0000")) return empty("This is not a CSV text file (it contains binary data).");
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), {
    header: true, skipEmptyLines: "greedy", transformHeader: (h) => h.trim().toLowerCase(),
  });
  const fields = parsed.meta.fields ?? [];
  const missing = REQUIRED.filter((c) => !fields.includes(c));
  const unknown = fields.filter((f) => !(CSV_COLUMNS as readonly string[]).includes(f));
  if (missing.length || unknown.length || !(fields.includes("catalog_slug") || (fields.includes("maker") && fields.includes("model")))) {
    const parts = [
      missing.length ? `missing ${missing.join(", ")}` : "",
      unknown.length ? `unknown ${unknown.slice(0, 5).map((u) => JSON.stringify(u.slice(0, 40))).join(", ")}` : "",
      !fields.includes("catalog_slug") && !(fields.includes("maker") && fields.includes("model")) ? "no catalog_slug (or maker and model) to find the part by" : "",
    ].filter(Boolean);
    return empty(`The columns do not fit: ${parts.join("; ")}. Expected: ${CSV_COLUMNS.join(", ")}.`);
  }
  if (parsed.data.length === 0) return empty("The file has a header but no rows.");
  if (parsed.data.length > LIMITS.items) return empty(`At most ${LIMITS.items} rows per file; this one has ${parsed.data.length}.`);

  const seenSku = new Map<string, number>(), seenPart = new Map<string, number>();
  const skuOwner = new Map([...current].map(([partId, s]) => [s.sku.toLowerCase(), partId]));
  const rows = parsed.data.map((rec, i): PreviewRow => {
    const line = i + 2; // the header is line 1
    const errors: string[] = [];
    const get = (k: string) => (rec[k] ?? "").trim();
    const slug = get("catalog_slug");
    const part = slug ? catalog.bySlug.get(slug.toLowerCase()) ?? null
      : get("maker") && get("model") ? catalog.byMakerModel.get(makerModelKey(get("maker"), get("model"))) ?? null : null;
    if (!part) errors.push(slug ? `Unknown part "${slug.slice(0, 80)}" in the catalog` : get("maker") || get("model") ? `Unknown part "${`${get("maker")} ${get("model")}`.slice(0, 80)}" in the catalog` : "No catalog_slug, maker or model");
    const item = inventoryItemSchema.safeParse({
      part: part?.slug ?? "x", sku: get("sku"), priceCents: wholeNumber(get("price_cents")) ?? undefined,
      currency: get("currency"), onHand: wholeNumber(get("on_hand")) ?? undefined,
    });
    if (!item.success) {
      for (const issue of item.error.issues) {
        const field = String(issue.path[0]);
        const label = field === "priceCents" ? "Price" : field === "onHand" ? "On hand" : field === "sku" ? "SKU" : field === "currency" ? "Currency" : field;
        errors.push(issue.message.startsWith(label) ? issue.message : `${label}: ${issue.message}`);
      }
    }
    const sku = get("sku").slice(0, LIMITS.skuChars);
    const skuKey = sku.toLowerCase();
    if (sku && seenSku.has(skuKey)) errors.push(`Duplicate SKU: also on line ${seenSku.get(skuKey)}`);
    else if (sku) seenSku.set(skuKey, line);
    if (part && seenPart.has(part.id)) errors.push(`The same part is also on line ${seenPart.get(part.id)}`);
    else if (part) seenPart.set(part.id, line);
    if (part && sku) {
      const holder = skuOwner.get(skuKey);
      if (holder && holder !== part.id && !seenPart.has(holder)) errors.push("Duplicate SKU: another stocked part already uses it");
    }
    const onHand = item.success ? item.data.onHand : null;
    const reserved = part ? current.get(part.id)?.reserved ?? 0 : 0;
    if (onHand !== null && onHand < reserved) errors.push(`Stock ${onHand} is below the ${reserved} reserved for orders`);
    return {
      line, sku, part, errors,
      priceCents: item.success ? item.data.priceCents : null,
      currency: item.success ? item.data.currency : get("currency").slice(0, 3),
      onHand, action: errors.length ? null : current.has(part!.id) ? "update" : "add",
    };
  });
  const errorCount = rows.filter((r) => r.errors.length).length;
  return { rows, errors: [], okCount: rows.length - errorCount, errorCount };
}

export type ExportRow = { slug: string; maker: string; model: string; sku: string; priceCents: number; currency: string; onHand: number };

/**
 * The stock as CSV. Cells a spreadsheet would run as a formula (starting with = + - @, tab or
 * carriage return) are prefixed with an apostrophe by papaparse's `escapeFormulae`.
 */
export function exportInventoryCsv(rows: ExportRow[]): string {
  return Papa.unparse({
    fields: [...CSV_COLUMNS],
    data: rows.map((r) => [r.slug, r.maker, r.model, r.sku, String(r.priceCents), r.currency, String(r.onHand)]),
  }, { escapeFormulae: true, newline: "\r\n" });
}
