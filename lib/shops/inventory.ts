import "server-only";
import { applyInventory, catalogLookup, currentStockByPart, listInventory } from "@/db/queries/shops-inventory";
import { getApprovedPartsByRefs } from "@/db/queries/parts";
import { AppError } from "@/lib/errors";
import type { InventoryPut } from "@/lib/validation/shops";
import { makerModelKey, previewInventoryCsv, type CatalogLookup } from "./csv";

/** PUT: resolve each line's catalog part, then write all lines or none. */
export async function putInventory({ organizationId, body }: { organizationId: string; body: InventoryPut }) {
  const refs = [...body.items.map((i) => i.part), ...body.remove];
  const rows = await getApprovedPartsByRefs({ refs });
  const idOf = new Map<string, string>();
  for (const r of rows) { idOf.set(r.slug, r.id); idOf.set(r.id, r.id); }
  const fields: Record<string, string[]> = {};
  body.items.forEach((it, i) => { if (!idOf.has(it.part)) fields[`items.${i}.part`] = [`No approved part "${it.part}" in the catalog`]; });
  body.remove.forEach((ref, i) => { if (!idOf.has(ref)) fields[`remove.${i}`] = [`No approved part "${ref}" in the catalog`]; });
  if (Object.keys(fields).length) throw new AppError("bad_request:validation", "Some lines name parts that are not in the catalog.", fields);
  const result = await applyInventory({
    organizationId,
    items: body.items.map((it) => ({ partId: idOf.get(it.part)!, sku: it.sku, priceCents: it.priceCents, currency: it.currency, onHand: it.onHand })),
    removePartIds: body.remove.map((r) => idOf.get(r)!),
  });
  return { ...result, items: await listInventory({ organizationId }) };
}

async function lookup(): Promise<CatalogLookup> {
  const rows = await catalogLookup();
  const bySlug = new Map(), byMakerModel = new Map();
  for (const r of rows) {
    const entry = { id: r.id, slug: r.slug, name: `${r.maker} ${r.model}` };
    bySlug.set(r.slug, entry);
    byMakerModel.set(makerModelKey(r.maker, r.model), entry);
  }
  return { bySlug, byMakerModel };
}

/** Check an uploaded CSV; with `confirm`, apply every row in one transaction, or none when any row is wrong. */
export async function importInventoryCsv({ organizationId, text, confirm }: { organizationId: string; text: string; confirm: boolean }) {
  const preview = previewInventoryCsv(text, await lookup(), await currentStockByPart({ organizationId }));
  if (preview.errors.length) throw new AppError("bad_request:csv", preview.errors[0]);
  if (!confirm) return { applied: false, ...preview };
  if (preview.errorCount > 0) {
    throw new AppError("bad_request:csv", `${preview.errorCount} row${preview.errorCount === 1 ? " needs" : "s need"} fixing; nothing was imported.`);
  }
  await applyInventory({
    organizationId,
    items: preview.rows.map((r) => ({ partId: r.part!.id, sku: r.sku, priceCents: r.priceCents!, currency: r.currency, onHand: r.onHand! })),
  });
  return { applied: true, ...preview };
}
