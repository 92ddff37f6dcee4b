import "server-only";
import { and, asc, eq, gt, inArray, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { paymentEvents, quoteLines, quotes, shopInventory, type QuoteRow } from "@/db/schema";
import { AppError } from "@/lib/errors";
import { isExpired } from "@/lib/payments/status";

// Stock moves here and only here, always in one transaction that locks the quote row first
// and then its inventory rows in id order (so two transactions never wait on each other in a circle).

type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

async function lockedLines(tx: Tx, quoteId: string) {
  const lines = await tx.select().from(quoteLines).where(and(eq(quoteLines.quoteId, quoteId), gt(quoteLines.quantity, 0))).orderBy(asc(quoteLines.inventoryId));
  const ids = lines.map((l) => l.inventoryId).filter((x): x is string => !!x);
  const stock = ids.length ? await tx.select().from(shopInventory).where(inArray(shopInventory.id, ids)).orderBy(asc(shopInventory.id)).for("update") : [];
  return { lines, stock: new Map(stock.map((s) => [s.id, s])) };
}

export type Reservation =
  | { kind: "reserved"; quote: QuoteRow; lines: (typeof quoteLines.$inferSelect)[] }
  | { kind: "open"; url: string };

/**
 * Reserve every quoted quantity (reserved += n) or nothing: 409 naming the parts that are short.
 * A quote already awaiting payment answers with its open payment page instead of reserving twice.
 */
export async function reserveForCheckout({ quoteId, buyerId }: { quoteId: string; buyerId: string }): Promise<Reservation> {
  return db.transaction(async (tx) => {
    const [q] = await tx.select().from(quotes).where(and(eq(quotes.id, quoteId), eq(quotes.buyerId, buyerId))).for("update");
    if (!q) throw new AppError("not_found:quote", "No quote of yours with this number.");
    if (q.status === "awaiting_payment") {
      if (q.checkoutUrl) return { kind: "open", url: q.checkoutUrl };
      throw new AppError("conflict:quote", "A payment page is being prepared for this quote; try again in a moment.");
    }
    if (q.status === "requested") throw new AppError("conflict:quote", "The shop has not answered this request yet.");
    if (q.status !== "quoted") throw new AppError("conflict:quote", "This quote is closed; there is nothing to pay.");
    if (isExpired(q)) throw new AppError("conflict:quote_expired", `This quote expired on ${q.expiresAt!.toISOString().slice(0, 10)}. Ask the shop for a fresh one.`);
    const { lines, stock } = await lockedLines(tx, q.id);
    const short: string[] = [];
    for (const l of lines) {
      const row = l.inventoryId ? stock.get(l.inventoryId) : undefined;
      const available = row ? row.onHand - row.reserved : 0;
      if (available < l.quantity) short.push(`${l.name} (${l.quantity} quoted, ${Math.max(0, available)} in stock)`);
    }
    if (short.length) throw new AppError("conflict:out_of_stock", `Out of stock: ${short.join("; ")}. Ask the shop for a new quote.`);
    for (const l of lines) {
      await tx.update(shopInventory).set({ reserved: sql`${shopInventory.reserved} + ${l.quantity}`, updatedAt: new Date() }).where(eq(shopInventory.id, l.inventoryId!));
    }
    const [row] = await tx.update(quotes).set({ status: "awaiting_payment", checkoutSessionId: null, checkoutUrl: null, updatedAt: new Date() }).where(eq(quotes.id, q.id)).returning();
    return { kind: "reserved", quote: row, lines };
  });
}

export async function attachCheckoutSession({ quoteId, sessionId, url }: { quoteId: string; sessionId: string; url: string }) {
  await db.update(quotes).set({ checkoutSessionId: sessionId, checkoutUrl: url, updatedAt: new Date() })
    .where(and(eq(quotes.id, quoteId), eq(quotes.status, "awaiting_payment")));
}

/** reserved -= n and back to "quoted", when the quote is awaiting this session's payment. */
async function releaseIn(tx: Tx, q: QuoteRow): Promise<boolean> {
  if (q.status !== "awaiting_payment") return false;
  const { lines } = await lockedLines(tx, q.id);
  for (const l of lines) {
    if (l.inventoryId) await tx.update(shopInventory).set({ reserved: sql`${shopInventory.reserved} - ${l.quantity}`, updatedAt: new Date() }).where(eq(shopInventory.id, l.inventoryId));
  }
  await tx.update(quotes).set({ status: "quoted", checkoutSessionId: null, checkoutUrl: null, updatedAt: new Date() }).where(eq(quotes.id, q.id));
  return true;
}

/** Reserved moves to sold: on hand and reserved both shrink by n; the quote becomes a paid order. */
async function settleIn(tx: Tx, q: QuoteRow, paymentIntentId: string | null): Promise<boolean> {
  if (q.status !== "awaiting_payment") return false;
  const { lines } = await lockedLines(tx, q.id);
  for (const l of lines) {
    if (l.inventoryId) {
      await tx.update(shopInventory).set({ onHand: sql`${shopInventory.onHand} - ${l.quantity}`, reserved: sql`${shopInventory.reserved} - ${l.quantity}`, updatedAt: new Date() })
        .where(eq(shopInventory.id, l.inventoryId));
    }
  }
  await tx.update(quotes).set({ status: "paid", paymentIntentId, paidAt: new Date(), checkoutUrl: null, updatedAt: new Date() }).where(eq(quotes.id, q.id));
  return true;
}

/** Used when a payment page could not be made: the reservation just taken goes back. */
export async function releasePendingReservation({ quoteId }: { quoteId: string }) {
  return db.transaction(async (tx) => {
    const [q] = await tx.select().from(quotes).where(eq(quotes.id, quoteId)).for("update");
    return q && !q.checkoutSessionId ? releaseIn(tx, q) : false;
  });
}

export type SessionFacts = { sessionId: string; status: string; paymentStatus: string; paymentIntentId: string | null; amountTotal: number | null; currency: string | null };
export type SessionOutcome = "paid" | "released" | "ignored";

/** One session's news, applied at most once: paid settles, expired releases, anything else waits. */
async function applySessionIn(tx: Tx, s: SessionFacts): Promise<{ outcome: SessionOutcome; quoteId: string | null; note?: string }> {
  const [q] = await tx.select().from(quotes).where(eq(quotes.checkoutSessionId, s.sessionId)).for("update");
  if (!q) return { outcome: "ignored", quoteId: null, note: "no quote awaits this session" };
  if (s.status === "complete" && s.paymentStatus === "paid") {
    if (s.amountTotal !== q.totalCents || s.currency?.toLowerCase() !== q.currency.toLowerCase()) {
      console.error(`[payments] session ${s.sessionId} paid ${s.amountTotal} ${s.currency}; quote ${q.ref} expects ${q.totalCents} ${q.currency}`);
      return { outcome: "ignored", quoteId: q.id, note: "amount differs from the quote" };
    }
    return { outcome: (await settleIn(tx, q, s.paymentIntentId)) ? "paid" : "ignored", quoteId: q.id };
  }
  if (s.status === "expired") return { outcome: (await releaseIn(tx, q)) ? "released" : "ignored", quoteId: q.id };
  return { outcome: "ignored", quoteId: q.id, note: `session ${s.status}` };
}

/**
 * A verified provider event, handled exactly once by its id: the event row is written in the
 * same transaction as the stock it moves, so a replay finds the row and changes nothing.
 */
export async function applyPaymentEvent({ eventId, type, session }: { eventId: string; type: string; session: SessionFacts | null }) {
  return db.transaction(async (tx) => {
    const [fresh] = await tx.insert(paymentEvents).values({ eventId, type, outcome: "pending" }).onConflictDoNothing().returning();
    if (!fresh) return { duplicate: true as const, outcome: "ignored" as SessionOutcome, quoteId: null };
    const result = session ? await applySessionIn(tx, session) : { outcome: "ignored" as SessionOutcome, quoteId: null, note: "not an event Trainyard acts on" };
    await tx.update(paymentEvents).set({ outcome: result.note ? `${result.outcome}: ${result.note}` : result.outcome, quoteId: result.quoteId }).where(eq(paymentEvents.eventId, eventId));
    return { duplicate: false as const, ...result };
  });
}

/** The same rules for a session read back from the provider (when a webhook is late), without an event id. */
export async function applySessionState(session: SessionFacts) {
  return db.transaction((tx) => applySessionIn(tx, session));
}
