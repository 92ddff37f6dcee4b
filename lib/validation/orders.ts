import { z } from "zod";

const slug = (what: string) => z.string({ message: `Which ${what}` }).trim().min(1, `Choose a ${what}`).max(160, "Too long");
const note = z.string().trim().max(2000, "At most 2,000 characters");

/** POST /api/v1/quotes — a buyer asks a shop for the parts of a saved build. */
export const createQuoteSchema = z.object({
  build: slug("build"),
  shop: slug("shop"),
  note: note.optional(),
}).strict();
export type CreateQuoteInput = z.infer<typeof createQuoteSchema>;

export const MAX_LINE_QUANTITY = 99;
export const MAX_VALID_DAYS = 60;
/** A generous ceiling (a million in the major unit) that keeps every sum inside an integer column. */
export const MAX_AMOUNT_MINOR = 100_000_000;

const minor = (what: string) => z.number({ message: `${what} in the smallest currency unit` }).int("A whole number of the smallest unit (cents)").min(0, "Not negative").max(MAX_AMOUNT_MINOR, "Too large");

/** POST /api/v1/quotes/[id]/answer — the shop's quote. Lines are the request's own; nothing else is priced. */
export const answerQuoteSchema = z.object({
  lines: z.array(z.object({
    id: z.string().trim().min(1).max(80),
    quantity: z.number({ message: "How many" }).int("A whole number").min(0, "0 drops the line").max(MAX_LINE_QUANTITY, `At most ${MAX_LINE_QUANTITY}`),
    unitPriceCents: minor("Unit price"),
  }).strict()).max(100, "At most 100 lines"),
  shippingCents: minor("Shipping"),
  note: note.optional(),
  validDays: z.number({ message: "For how many days the quote holds" }).int("A whole number of days").min(1, "At least 1 day").max(MAX_VALID_DAYS, `At most ${MAX_VALID_DAYS} days`),
}).strict().refine((v) => v.lines.some((l) => l.quantity > 0), { message: "Quote at least one part (a quantity above 0)", path: ["lines"] });
export type AnswerQuoteInput = z.infer<typeof answerQuoteSchema>;

/** POST /api/v1/quotes/[id]/cancel — buyer withdraws or shop declines. */
export const cancelQuoteSchema = z.object({ reason: z.string().trim().max(500, "At most 500 characters").optional() }).strict();

/** POST /api/v1/orders/[id]/ship */
export const shipOrderSchema = z.object({
  tracking: z.string({ message: "How the buyer follows the parcel" }).trim().min(1, "Give the carrier and tracking number, or how it travels").max(300, "At most 300 characters"),
}).strict();

/** POST /api/v1/orders/[id]/refund */
export const refundOrderSchema = z.object({ reason: z.string().trim().max(500, "At most 500 characters").optional() }).strict();

/** GET /api/v1/orders?shop=slug */
export const listShopOrdersSchema = z.object({ shop: slug("shop") });
