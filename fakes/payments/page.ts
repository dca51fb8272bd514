// The fake's payment page: our own plain design, no brand names or logos. A person clicks "Pay" and
// is sent back to the shop, as with a hosted payment page.
export interface PageSession {
  id: string;
  amountTotal: number;
  currency: string;
  productName: string;
  status: "open" | "complete" | "expired";
  cancelUrl: string;
  successUrl: string;
}

const esc = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

export function formatAmount(minor: number, currency: string): string {
  const format = new Intl.NumberFormat("en-GB", { style: "currency", currency: currency.toUpperCase() });
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  return format.format(minor / 10 ** digits);
}

const frame = (title: string, body: string) => `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${esc(title)}</title>
<style>
body{margin:0;font:16px/1.5 system-ui,sans-serif;background:#f3f4f1;color:#1c1f1a}
main{max-width:26rem;margin:2rem auto;padding:1.5rem;background:#fff;border:1px solid #d5d9cf;border-radius:12px}
h1{font-size:1.25rem;margin:0 0 .25rem}
.amount{font-size:2rem;font-weight:700;margin:.5rem 0 1rem}
.note{font-size:.875rem;color:#545b4e;background:#f7f7f2;border-radius:8px;padding:.75rem}
label{display:block;font-size:.875rem;margin-top:1rem}
input{width:100%;box-sizing:border-box;padding:.6rem;border:1px solid #9aa192;border-radius:8px;font-size:1rem}
button{margin-top:1.25rem;width:100%;padding:.8rem;border:0;border-radius:8px;background:#2f5d3a;color:#fff;font-size:1.05rem;font-weight:600;cursor:pointer}
a{color:#2f5d3a}
</style></head><body><main>${body}</main></body></html>`;

export function paymentPage(session: PageSession): string {
  const amount = formatAmount(session.amountTotal, session.currency);
  if (session.status !== "open")
    return frame(
      "Payment",
      `<h1>${session.status === "complete" ? "Already paid" : "This payment has expired"}</h1>
<p><a href="${esc(session.successUrl)}">Back to the shop</a></p>`,
    );
  return frame(
    `Pay ${amount}`,
    `<h1>${esc(session.productName)}</h1>
<p class="amount">${esc(amount)}</p>
<p class="note">Local test payment page: no money moves and no card is checked.</p>
<form method="post" action="/pay/${esc(session.id)}">
<label for="name">Name on the card</label><input id="name" name="name" autocomplete="off" value="Test rider">
<label for="card">Card number</label><input id="card" name="card" inputmode="numeric" autocomplete="off" value="0000 0000 0000 0000">
<button type="submit">Pay ${esc(amount)}</button>
</form>
<p><a href="${esc(session.cancelUrl)}">Cancel and go back</a></p>`,
  );
}
