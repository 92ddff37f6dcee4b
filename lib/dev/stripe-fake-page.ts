// The local payment fake's hosted page: deliberately plain, so nobody mistakes it for a real
// payment provider. Plain HTML, no scripts beyond filling a test card number.

/** The fake's test cards: the first pays, the second is declined. */
export const TEST_CARDS = { succeeds: "4242 4242 4242 4242", declines: "4000 0000 0000 0002" } as const;

const esc = (s: unknown) => String(s).replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

function money(amount: number, currency: string) {
  const f = new Intl.NumberFormat("en-US", { style: "currency", currency: currency.toUpperCase() });
  return f.format(amount / 10 ** (f.resolvedOptions().maximumFractionDigits ?? 2));
}

const STYLE = `
  body { margin: 0; font: 15px/1.5 ui-monospace, "DejaVu Sans Mono", monospace; background: #e6e6e6; color: #111; }
  .tape { background: repeating-linear-gradient(-45deg, #ffd400 0 18px, #111 18px 36px); height: 14px; }
  .banner { background: #111; color: #ffd400; padding: 10px 16px; font-weight: bold; letter-spacing: .04em; }
  main { max-width: 560px; margin: 28px auto; background: #fff; border: 2px dashed #777; padding: 20px 24px; }
  h1 { font-size: 18px; margin: 0 0 4px; }
  .muted { color: #555; font-size: 13px; }
  table { width: 100%; border-collapse: collapse; margin: 14px 0; }
  td, th { padding: 6px 4px; border-bottom: 1px solid #ccc; text-align: left; }
  td.n, th.n { text-align: right; }
  tfoot td { font-weight: bold; border-bottom: 0; }
  label { display: block; font-weight: bold; margin-top: 14px; }
  input { font: inherit; width: 100%; box-sizing: border-box; padding: 8px; border: 2px solid #111; background: #fffbe0; }
  button { font: inherit; margin-top: 14px; padding: 8px 16px; border: 2px solid #111; background: #111; color: #fff; cursor: pointer; }
  .cards button { background: #fff; color: #111; margin: 6px 6px 0 0; padding: 4px 8px; font-size: 13px; }
  .err { border: 2px solid #b00; background: #fee; padding: 8px; margin-top: 12px; }
  a { color: #0645ad; }
`;

function shell(title: string, inner: string) {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>${esc(title)} · local payment fake</title><style>${STYLE}</style></head><body>
<div class="tape"></div><div class="banner">LOCAL PAYMENT FAKE · for development and tests · no card is charged, no money moves</div>
<main>${inner}</main></body></html>`;
}

export function fakePaymentPage({ session, items, error }: {
  session: { id: string; amount_total: number; currency: string; cancel_url: string | null; expires_at?: unknown };
  items: { name: string; unitAmount: number; quantity: number }[]; error?: string;
}) {
  const rows = items.map((i) => `<tr><td>${esc(i.name)}</td><td class="n">${i.quantity}</td><td class="n">${esc(money(i.unitAmount * i.quantity, session.currency))}</td></tr>`).join("");
  return shell("Pay", `
<h1>Test payment</h1>
<p class="muted">Session <code>${esc(session.id)}</code> · open until ${esc(new Date(Number(session.expires_at) * 1000).toISOString().replace("T", " ").slice(0, 16))} UTC</p>
<table><thead><tr><th>Item</th><th class="n">Qty</th><th class="n">Amount</th></tr></thead><tbody>${rows}</tbody>
<tfoot><tr><td colspan="2">Total</td><td class="n">${esc(money(session.amount_total, session.currency))}</td></tr></tfoot></table>
${error ? `<div class="err" role="alert">${esc(error)}</div>` : ""}
<form method="post">
  <label for="card">Test card number</label>
  <input id="card" name="card" inputmode="numeric" autocomplete="off" placeholder="one of the two test cards below" required>
  <div class="cards muted">Fill in:
    <button type="button" onclick="document.getElementById('card').value='${TEST_CARDS.succeeds}'">${TEST_CARDS.succeeds} · pays</button>
    <button type="button" onclick="document.getElementById('card').value='${TEST_CARDS.declines}'">${TEST_CARDS.declines} · is declined</button>
  </div>
  <button type="submit">Pay ${esc(money(session.amount_total, session.currency))} (test)</button>
</form>
${session.cancel_url ? `<p class="muted"><a href="${esc(session.cancel_url)}">Back without paying</a> (the session stays open until it expires or the shop's site ends it)</p>` : ""}`);
}

export function fakeResultPage({ title, body, back }: { title: string; body: string; back?: string | null }) {
  return shell(title, `<h1>${esc(title)}</h1><p>${esc(body)}</p>${back ? `<p><a href="${esc(back)}">Back to the shop's site</a></p>` : ""}`);
}
