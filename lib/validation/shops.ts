// Shop inputs: inventory rows (the table, the API and the CSV import share one schema),
// staff invitations and API keys. Prices are whole numbers in the currency's smallest unit.
import { z } from "zod";

/** ISO 4217 codes this runtime knows (Intl's list, not a hand-kept copy). */
export const CURRENCIES: ReadonlySet<string> = new Set(Intl.supportedValuesOf("currency"));

export const LIMITS = { skuChars: 64, items: 5000, importBytes: 5 * 1024 * 1024, maxPriceMinor: 100_000_000, maxStock: 1_000_000 } as const;

// A SKU starts with a letter or digit, so a spreadsheet never reads one as a formula.
const SKU = /^[A-Za-z0-9][A-Za-z0-9._/-]*$/;

export const skuSchema = z.string({ error: "Give the shop's SKU" }).trim().min(1, "Give the shop's SKU")
  .max(LIMITS.skuChars, `At most ${LIMITS.skuChars} characters`)
  .regex(SKU, "Letters, digits, . _ / - only, starting with a letter or digit");

export const currencySchema = z.string({ error: "Give an ISO 4217 currency code" }).trim().toUpperCase()
  .refine((c) => CURRENCIES.has(c), "Not an ISO 4217 currency code (e.g. USD, EUR, GBP, JPY)");

export const priceMinorSchema = z.number({ error: "Price must be a whole number" })
  .int("Price is a whole number in the smallest unit (cents, pence, yen)")
  .min(0, "Price cannot be negative").max(LIMITS.maxPriceMinor, "Price is too large");

export const stockSchema = (what: string) => z.number({ error: `${what} must be a whole number` })
  .int(`${what} is a whole number`).min(0, `${what} cannot be negative`).max(LIMITS.maxStock, `${what} is too large`);

/** One stock line, naming the catalog part by slug (or id). */
export const inventoryItemSchema = z.object({
  part: z.string({ error: "Name the catalog part" }).trim().min(1, "Name the catalog part").max(200),
  sku: skuSchema,
  priceCents: priceMinorSchema,
  currency: currencySchema,
  onHand: stockSchema("On hand"),
});
export type InventoryItemInput = z.infer<typeof inventoryItemSchema>;

/** PUT /api/v1/shops/[slug]/inventory: add or update these lines; `remove` drops lines by part. */
export const inventoryPutSchema = z.object({
  items: z.array(inventoryItemSchema).max(LIMITS.items, `At most ${LIMITS.items} lines at once`).default([]),
  remove: z.array(z.string().trim().min(1).max(200)).max(LIMITS.items).default([]),
}).superRefine((body, ctx) => {
  const parts = new Map<string, number>(), skus = new Map<string, number>();
  body.items.forEach((it, i) => {
    if (parts.has(it.part)) ctx.addIssue({ code: "custom", path: ["items", i, "part"], message: `This part is also on line ${parts.get(it.part)! + 1}` });
    else parts.set(it.part, i);
    const k = it.sku.toLowerCase();
    if (skus.has(k)) ctx.addIssue({ code: "custom", path: ["items", i, "sku"], message: `SKU also used on line ${skus.get(k)! + 1}` });
    else skus.set(k, i);
  });
});
export type InventoryPut = z.infer<typeof inventoryPutSchema>;

export const inviteStaffSchema = z.object({
  email: z.string({ error: "Give an e-mail address" }).trim().toLowerCase().max(254, "That address is too long").pipe(z.email("Give an e-mail address")),
});

export const removeMemberSchema = z.object({ memberId: z.string().trim().min(1, "Choose a member").max(200) });

export const createApiKeySchema = z.object({
  name: z.string({ error: "Name the key" }).trim().min(1, "Name the key (e.g. the till that uses it)").max(80, "At most 80 characters"),
});

export const shopSlugSchema = z.string().trim().min(1).max(140).regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "Not a shop address");

/** POST /api/v1/shops/where-to-buy: the parts still to buy, by catalog slug, with counts. */
export const whereToBuySchema = z.object({
  parts: z.array(z.object({ slug: z.string().trim().min(1).max(200), quantity: z.number().int().min(1).max(100) }))
    .min(1, "Name at least one part to buy").max(50, "At most 50 parts"),
});
export type WhereToBuyInput = z.infer<typeof whereToBuySchema>;
