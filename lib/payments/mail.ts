import "server-only";
import type { QuoteRow } from "@/db/schema";
import { siteOrigin } from "@/lib/builds/site-url";
import { linkMail, sendMail } from "@/lib/mail";
import { formatMoney } from "./money";

// One e-mail per step. Mail never blocks or undoes the step itself: a failed send is logged.

const quoteUrl = (q: QuoteRow) => `${siteOrigin(null)}/quotes/${q.id}`;
const shopUrl = (q: QuoteRow) => `${siteOrigin(null)}/shop/orders/${q.id}`;

async function send(to: string | string[], subject: string, body: { text: string; html: string }) {
  const list = Array.isArray(to) ? to : [to];
  await Promise.all(list.map((addr) => sendMail({ to: addr, subject, ...body }).catch((err) => console.error(`[mail] "${subject}" to ${addr} failed: ${(err as Error).message}`))));
}

export const orderMail = {
  requested: (q: QuoteRow, shopEmails: string[], buyerName: string) => send(shopEmails, `Quote request ${q.ref}: ${q.buildTitle}`,
    linkMail(`${buyerName} asks for a quote on the parts of "${q.buildTitle}".${q.buyerNote ? ` Their note: "${q.buyerNote}"` : ""}`, shopUrl(q), "Open the request", "Adjust quantities, prices and shipping, then send the quote.")),
  quoted: (q: QuoteRow, buyerEmail: string, shopName: string) => send(buyerEmail, `Your quote ${q.ref} from ${shopName}`,
    linkMail(`${shopName} quoted ${formatMoney(q.totalCents, q.currency)} for the parts of "${q.buildTitle}", valid until ${q.expiresAt?.toISOString().slice(0, 10)}.${q.shopNote ? ` The shop's note: "${q.shopNote}"` : ""}`, quoteUrl(q), "See the quote and pay")),
  cancelled: (q: QuoteRow, to: string | string[], who: string) => send(to, `Quote ${q.ref} cancelled`,
    linkMail(`${who} cancelled quote ${q.ref} for "${q.buildTitle}".${q.cancelReason ? ` Reason: "${q.cancelReason}"` : ""}`, quoteUrl(q), "See the quote")),
  paid: async (q: QuoteRow, buyerEmail: string, shopEmails: string[], shopName: string) => {
    await send(buyerEmail, `Paid: order ${q.ref} from ${shopName}`,
      linkMail(`Thank you: ${formatMoney(q.totalCents, q.currency)} is paid and ${shopName} has your parts set aside. You will get another e-mail when they ship.`, quoteUrl(q), "See your order"));
    await send(shopEmails, `Order ${q.ref} paid: ready to ship`,
      linkMail(`The buyer paid ${formatMoney(q.totalCents, q.currency)} for "${q.buildTitle}". The stock has been taken off your shelf count.`, shopUrl(q), "Open the order"));
  },
  shipped: (q: QuoteRow, buyerEmail: string, shopName: string) => send(buyerEmail, `Shipped: order ${q.ref}`,
    linkMail(`${shopName} shipped your parts for "${q.buildTitle}". Tracking: ${q.tracking}`, quoteUrl(q), "See your order")),
  refunded: (q: QuoteRow, buyerEmail: string, shopName: string) => send(buyerEmail, `Refunded: order ${q.ref}`,
    linkMail(`${shopName} refunded ${formatMoney(q.totalCents, q.currency)} for order ${q.ref}. It returns to the card you paid with.`, quoteUrl(q), "See your order")),
};
