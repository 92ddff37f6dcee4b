import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { quoteLines, quotes, type QuoteRow } from "@/db/schema";
import type { OrderStatus } from "@/db/schema-orders";
import { AppError } from "@/lib/errors";
import { quoteTotal } from "@/lib/payments/money";
import { canAnswer, canCancel, canRefund, canShip } from "@/lib/payments/status";
import type { AnswerQuoteInput } from "@/lib/validation/orders";

const REF_ALPHABET = "23456789ABCDEFGHJKMNPQRSTUVWXYZ";
function newRef() {
  const bytes = crypto.getRandomValues(new Uint8Array(6));
  return `Q-${[...bytes].map((b) => REF_ALPHABET[b % REF_ALPHABET.length]).join("")}`;
}

export type NewQuoteLine = { inventoryId: string; partId: string; sku: string; name: string; quantity: number; unitPriceCents: number };

export async function insertQuoteRequest({ values, lines }: {
  values: Pick<QuoteRow, "buyerId" | "organizationId" | "buildId" | "buildSlug" | "buildTitle" | "train" | "missing" | "buyerNote" | "currency">;
  lines: NewQuoteLine[];
}): Promise<QuoteRow> {
  return db.transaction(async (tx) => {
    let row: QuoteRow | undefined;
    for (let attempt = 0; attempt < 5 && !row; attempt++) {
      [row] = await tx.insert(quotes).values({ ...values, ref: newRef(), totalCents: quoteTotal(lines, 0) }).onConflictDoNothing({ target: quotes.ref }).returning();
    }
    if (!row) throw new AppError("internal", "Could not number the quote; please try again.");
    await tx.insert(quoteLines).values(lines.map((l, position) => ({ ...l, quoteId: row!.id, position, requestedQuantity: l.quantity })));
    return row;
  });
}

/** Lock a quote row for a state change; the caller's checks run on the locked row. */
async function lockQuote(tx: Parameters<Parameters<typeof db.transaction>[0]>[0], id: string) {
  const [q] = await tx.select().from(quotes).where(eq(quotes.id, id)).for("update");
  if (!q) throw new AppError("not_found:quote", "No quote with this number.");
  return q;
}

/** The shop's answer: quantities and prices of the request's own lines, shipping, note, validity. Totals are computed here. */
export async function answerQuote({ id, input }: { id: string; input: AnswerQuoteInput }): Promise<QuoteRow> {
  return db.transaction(async (tx) => {
    const q = await lockQuote(tx, id);
    if (!canAnswer(q.status)) throw new AppError("conflict:quote", q.status === "awaiting_payment" ? "The buyer is paying this quote right now; it cannot change." : "This quote is past answering.");
    const existing = await tx.select().from(quoteLines).where(eq(quoteLines.quoteId, id));
    const byId = new Map(existing.map((l) => [l.id, l]));
    const fields: Record<string, string[]> = {};
    input.lines.forEach((l, i) => { if (!byId.has(l.id)) fields[`lines.${i}.id`] = ["Not a line of this quote"]; });
    if (Object.keys(fields).length) throw new AppError("bad_request:validation", "Some lines are not part of this quote.", fields);
    const priced = existing.map((l) => {
      const change = input.lines.find((x) => x.id === l.id);
      return { ...l, quantity: change?.quantity ?? l.quantity, unitPriceCents: change?.unitPriceCents ?? l.unitPriceCents };
    });
    for (const l of priced) await tx.update(quoteLines).set({ quantity: l.quantity, unitPriceCents: l.unitPriceCents }).where(eq(quoteLines.id, l.id));
    const now = new Date();
    const [row] = await tx.update(quotes).set({
      status: "quoted", shippingCents: input.shippingCents, shopNote: input.note || null, validDays: input.validDays,
      totalCents: quoteTotal(priced, input.shippingCents), quotedAt: now, expiresAt: new Date(now.getTime() + input.validDays * 86_400_000), updatedAt: now,
    }).where(eq(quotes.id, id)).returning();
    return row;
  });
}

export async function cancelQuote({ id, reason }: { id: string; reason: string | null }): Promise<QuoteRow> {
  return db.transaction(async (tx) => {
    const q = await lockQuote(tx, id);
    if (!canCancel(q.status)) throw new AppError("conflict:quote", q.status === "awaiting_payment" ? "A payment is open for this quote; end it first." : "This quote can no longer be cancelled.");
    const [row] = await tx.update(quotes).set({ status: "cancelled", cancelledAt: new Date(), cancelReason: reason, updatedAt: new Date() }).where(eq(quotes.id, id)).returning();
    return row;
  });
}

export async function markShipped({ id, tracking }: { id: string; tracking: string }): Promise<QuoteRow> {
  return db.transaction(async (tx) => {
    const q = await lockQuote(tx, id);
    if (!canShip(q.status)) throw new AppError("conflict:order", q.status === "shipped" ? "This order is marked shipped already." : "Only a paid order can ship.");
    const [row] = await tx.update(quotes).set({ status: "shipped", tracking, shippedAt: new Date(), updatedAt: new Date() }).where(eq(quotes.id, id)).returning();
    return row;
  });
}

/** Claims the refund before the provider is asked, so two clicks never refund twice. */
export async function claimRefund({ id }: { id: string }): Promise<{ quote: QuoteRow; previous: OrderStatus }> {
  return db.transaction(async (tx) => {
    const q = await lockQuote(tx, id);
    if (!canRefund(q.status) || q.refundId) throw new AppError("conflict:order", q.status === "refunded" ? "This order is refunded already." : "Only a paid or shipped order can be refunded.");
    if (!q.paymentIntentId) throw new AppError("conflict:order", "This order has no payment to refund.");
    const [row] = await tx.update(quotes).set({ refundId: "pending", updatedAt: new Date() }).where(eq(quotes.id, id)).returning();
    return { quote: row, previous: q.status };
  });
}

export async function finishRefund({ id, refundId }: { id: string; refundId: string | null }) {
  const set = refundId ? { status: "refunded" as const, refundId, refundedAt: new Date(), updatedAt: new Date() } : { refundId: null, updatedAt: new Date() };
  await db.update(quotes).set(set).where(and(eq(quotes.id, id), eq(quotes.refundId, "pending")));
}
