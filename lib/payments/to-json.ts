// The JSON of a quote/order for its buyer or its shop. Stock numbers only for the shop.
import type { QuoteView } from "@/db/queries/orders";
import { displayStatus, isExpired } from "./status";

export function quoteToJson(view: QuoteView & { isBuyer: boolean; shopRole: string | null }) {
  const { quote: q, shop, buyer, lines } = view;
  return {
    id: q.id, ref: q.ref, status: q.status, statusLabel: displayStatus(q), expired: isExpired(q),
    shop: { name: shop.name, slug: shop.slug }, buyer: { name: buyer.name, ...(view.shopRole ? { email: buyer.email } : {}) },
    build: { slug: q.buildSlug, title: q.buildTitle }, train: q.train, missing: q.missing,
    buyerNote: q.buyerNote, shopNote: q.shopNote, currency: q.currency, shippingCents: q.shippingCents, totalCents: q.totalCents,
    validDays: q.validDays, quotedAt: q.quotedAt, expiresAt: q.expiresAt, paidAt: q.paidAt, shippedAt: q.shippedAt, tracking: q.tracking,
    refundedAt: q.refundedAt, cancelledAt: q.cancelledAt, cancelReason: q.cancelReason, createdAt: q.createdAt, updatedAt: q.updatedAt,
    paymentOpen: q.status === "awaiting_payment" && !!q.checkoutUrl,
    lines: lines.map((l) => ({
      id: l.id, partSlug: l.partSlug, sku: l.sku, name: l.name, requestedQuantity: l.requestedQuantity, quantity: l.quantity, unitPriceCents: l.unitPriceCents,
      ...(view.shopRole ? { onHand: l.onHand, reserved: l.reserved } : {}),
    })),
    viewer: { buyer: view.isBuyer, shopRole: view.shopRole },
  };
}
export type QuoteJson = ReturnType<typeof quoteToJson>;
