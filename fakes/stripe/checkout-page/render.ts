// The hosted checkout page of the fake processor: our own plain look, clearly marked as a test.
import { esc } from "../../kit/http";
import { TEST_CARDS } from "../test-cards";
import type { CheckoutSession, LineItem } from "../types";
import { formatMoney } from "./format";

const STYLE = `
:root { --ink:#1d2a2a; --muted:#5b6b69; --band:#0f4c47; --accent:#d9822b; --paper:#f6f3ec; --line:#d8d2c4; --bad:#a4262c; --good:#2f6b3a; }
* { box-sizing: border-box; }
body { margin:0; font: 16px/1.5 system-ui, -apple-system, "Segoe UI", sans-serif; color:var(--ink); background:var(--paper); }
header { background:var(--band); color:#fff; padding:14px 24px; display:flex; gap:12px; align-items:center; justify-content:space-between; flex-wrap:wrap; }
header strong { letter-spacing:.04em; }
.badge { background:repeating-linear-gradient(45deg,var(--accent),var(--accent) 8px,#e9a15a 8px,#e9a15a 16px); color:#1d1307; font-weight:700; font-size:12px; padding:3px 10px; border-radius:3px; text-transform:uppercase; }
main { max-width:920px; margin:24px auto; padding:0 16px; display:grid; grid-template-columns: 1fr 1fr; gap:20px; }
section { background:#fff; border:1px solid var(--line); border-radius:6px; padding:20px; align-self:start; }
h1 { font-size:20px; margin:0 0 12px; } h2 { font-size:16px; margin:0 0 10px; }
.total { font: 600 28px/1.2 ui-monospace, "SFMono-Regular", Menlo, monospace; margin:8px 0 16px; }
ul.items { list-style:none; margin:0; padding:0; } ul.items li { display:flex; justify-content:space-between; gap:12px; border-top:1px dashed var(--line); padding:8px 0; }
.mono { font-family: ui-monospace, "SFMono-Regular", Menlo, monospace; }
label { display:block; font-weight:600; font-size:14px; margin:12px 0 4px; }
input { width:100%; font:inherit; padding:9px 10px; border:1px solid #9aa5a3; border-radius:4px; background:#fff; }
input:focus { outline:3px solid #f0c38e; border-color:var(--band); }
.row { display:grid; grid-template-columns:1fr 1fr; gap:12px; }
button { font:inherit; cursor:pointer; border-radius:4px; }
button.pay { width:100%; margin-top:18px; padding:12px; border:0; background:var(--band); color:#fff; font-weight:700; }
button.pay:hover { background:#0b3a36; }
a.cancel { display:inline-block; margin-top:12px; color:var(--muted); }
.alert { border-left:4px solid var(--bad); background:#fbeeee; color:var(--bad); padding:10px 12px; margin-bottom:8px; }
.ok { border-left:4px solid var(--good); background:#edf6ee; color:var(--good); padding:10px 12px; }
.field-error { color:var(--bad); font-size:14px; margin:4px 0 0; }
table { width:100%; border-collapse:collapse; font-size:14px; } td { padding:4px 6px; border-top:1px solid var(--line); vertical-align:middle; }
td.mono { white-space:nowrap; } td button { border:1px solid var(--line); background:var(--paper); padding:2px 8px; }
.note { color:var(--muted); font-size:13px; }
@media (max-width: 720px) { main { grid-template-columns: 1fr; } td.mono { white-space:normal; } }
`;

function layout(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${esc(title)}</title><style>${STYLE}</style></head><body>
<header><strong>Testpay · local payment fake</strong><span class="badge">Test mode: no real money moves</span></header>
${body}</body></html>`;
}

function summary(s: CheckoutSession, items: LineItem[]): string {
  const rows = items
    .map((li) => `<li><span>${esc(li.description)}${li.quantity > 1 ? ` × ${li.quantity}` : ""}</span><span class="mono">${esc(formatMoney(li.amount_total, li.currency))}</span></li>`)
    .join("");
  return `<section aria-labelledby="order-h"><h1 id="order-h">Amount due</h1>
<p class="total" data-testid="amount-due">${esc(formatMoney(s.amount_total, s.currency))}</p>
<ul class="items">${rows}</ul>
<p class="note">Reference <span class="mono">${esc(s.id.slice(0, 20))}…</span></p></section>`;
}

export interface FormState {
  values: Record<string, string>;
  /** A message for the whole form (decline), or per field (bad input). */
  error: string | null;
  fieldErrors: Record<string, string>;
}

const emptyForm: FormState = { values: {}, error: null, fieldErrors: {} };

function field(name: string, label: string, f: FormState, attrs: string): string {
  const err = f.fieldErrors[name];
  const describedBy = err ? ` aria-invalid="true" aria-describedby="${name}-err"` : "";
  return `<label for="${name}">${esc(label)}</label><input id="${name}" name="${name}" value="${esc(f.values[name] ?? "")}" ${attrs}${describedBy}>${
    err ? `<p class="field-error" id="${name}-err">${esc(err)}</p>` : ""
  }`;
}

function testCardTable(): string {
  const rows = TEST_CARDS.map(
    (c) =>
      `<tr><td class="mono">${c.number.replace(/(\d{4})(?=\d)/g, "$1 ")}</td><td>${esc(c.label)}</td><td><button type="button" data-card="${c.number}">Use</button></td></tr>`,
  ).join("");
  return `<h2 style="margin-top:22px">Test cards</h2><p class="note">Any future expiry (e.g. 12/34) and any 3 digits for the code.</p>
<table><tbody>${rows}</tbody></table>
<script>document.querySelectorAll("[data-card]").forEach(function(b){b.addEventListener("click",function(){var i=document.getElementById("card_number");i.value=b.getAttribute("data-card");i.focus();});});</script>`;
}

export function checkoutPage(s: CheckoutSession, items: LineItem[], form: FormState = emptyForm): string {
  const alert = form.error ? `<div class="alert" role="alert" data-testid="payment-error">${esc(form.error)}</div>` : "";
  const email = s.customer_email
    ? `<p class="note">Receipt to <strong>${esc(s.customer_email)}</strong></p>`
    : field("email", "E-mail for the receipt", form, 'type="email" autocomplete="email"');
  const cancel = s.cancel_url ? `<a class="cancel" href="${esc(s.cancel_url)}">Cancel and go back</a>` : "";
  return layout(
    `Pay ${formatMoney(s.amount_total, s.currency)}`,
    `<main>${summary(s, items)}
<section aria-labelledby="pay-h"><h1 id="pay-h">Pay by card</h1>
<form method="post" action="/pay/${esc(s.id)}" novalidate>
<div aria-live="polite">${alert}</div>
${email}
${field("card_name", "Name on card", form, 'autocomplete="cc-name"')}
${field("card_number", "Card number", form, 'inputmode="numeric" autocomplete="cc-number" placeholder="4242 4242 4242 4242"')}
<div class="row"><div>${field("card_exp", "Expiry (MM/YY)", form, 'autocomplete="cc-exp" placeholder="12/34"')}</div>
<div>${field("card_cvc", "Security code", form, 'inputmode="numeric" autocomplete="cc-csc" placeholder="123"')}</div></div>
<button class="pay" type="submit">Pay ${esc(formatMoney(s.amount_total, s.currency))}</button>
</form>${cancel}
${testCardTable()}</section></main>`,
  );
}

export function closedPage(s: CheckoutSession): string {
  const body =
    s.status === "complete"
      ? `<div class="ok" role="status">This payment is complete.</div><p><a href="${esc(s.success_url.replace("{CHECKOUT_SESSION_ID}", s.id))}">Return to the shop</a></p>`
      : `<div class="alert" role="alert">This checkout has expired. Nothing was charged.</div>${s.cancel_url ? `<p><a href="${esc(s.cancel_url)}">Go back</a></p>` : ""}`;
  return layout("Checkout", `<main><section style="grid-column:1/-1"><h1>Checkout</h1>${body}</section></main>`);
}

export function messagePage(title: string, message: string): string {
  return layout(title, `<main><section style="grid-column:1/-1"><h1>${esc(title)}</h1><p>${esc(message)}</p></section></main>`);
}
