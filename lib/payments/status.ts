// What each order status means to the buyer and to the shop, and which steps it allows.
import type { OrderStatus } from "@/db/schema-orders";

export const STATUS_LABEL: Record<OrderStatus, string> = {
  requested: "Quote requested", quoted: "Quoted", awaiting_payment: "Awaiting payment", paid: "Paid",
  shipped: "Shipped", cancelled: "Cancelled", refunded: "Refunded",
};

export type StatusTone = "brass" | "glass" | "ok" | "muted" | "bad";
export const STATUS_TONE: Record<OrderStatus, StatusTone> = {
  requested: "brass", quoted: "glass", awaiting_payment: "brass", paid: "ok", shipped: "ok", cancelled: "muted", refunded: "muted",
};

type QuoteState = { status: OrderStatus; expiresAt: Date | string | null };

export function isExpired(q: QuoteState, at = new Date()): boolean {
  return q.status === "quoted" && !!q.expiresAt && new Date(q.expiresAt).getTime() <= at.getTime();
}

/** The label a person reads: an expired quote says so even though nothing wrote it yet. */
export function displayStatus(q: QuoteState, at = new Date()): string {
  return isExpired(q, at) ? "Quote expired" : STATUS_LABEL[q.status];
}

export const canAnswer = (s: OrderStatus) => s === "requested" || s === "quoted";
export const canCancel = (s: OrderStatus) => s === "requested" || s === "quoted";
export const canPay = (q: QuoteState) => (q.status === "quoted" && !isExpired(q)) || q.status === "awaiting_payment";
export const canShip = (s: OrderStatus) => s === "paid";
export const canRefund = (s: OrderStatus) => s === "paid" || s === "shipped";
