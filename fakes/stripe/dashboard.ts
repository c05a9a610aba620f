// GET / — a read-only overview for people running the demo: recent checkouts, balance
// transactions, payouts and webhook deliveries.
import { esc } from "../kit/http";
import { formatMoney } from "./checkout-page/format";
import { messagePage } from "./checkout-page/render";
import type { StripeState } from "./types";

const time = (s: number) => new Date(s * 1000).toISOString().replace("T", " ").slice(0, 19);

function table(title: string, head: string[], rows: string[][]): string {
  const body = rows.length
    ? rows.map((r) => `<tr>${r.map((c) => `<td>${c}</td>`).join("")}</tr>`).join("")
    : `<tr><td colspan="${head.length}">None yet.</td></tr>`;
  return `<h2>${esc(title)}</h2><table><thead><tr>${head.map((h) => `<td><strong>${esc(h)}</strong></td>`).join("")}</tr></thead><tbody>${body}</tbody></table>`;
}

export function dashboardPage(state: StripeState, webhookUrl: string): string {
  const last = <T>(o: Record<string, T>) => Object.values(o).reverse().slice(0, 20);
  const sessions = last(state.checkout_sessions).map((s) => [
    `<span class="mono">${esc(s.id.slice(0, 22))}…</span>`,
    esc(s.status),
    esc(formatMoney(s.amount_total, s.currency)),
    s.status === "open" && s.url ? `<a href="${esc(s.url)}">open page</a>` : "",
    time(s.created),
  ]);
  const txns = last(state.balance_transactions).map((t) => [
    `<span class="mono">${esc(t.id)}</span>`,
    esc(t.type),
    esc(formatMoney(t.amount, t.currency)),
    esc(formatMoney(t.fee, t.currency)),
    esc(formatMoney(t.net, t.currency)),
    esc(state.payout_of[t.id] ?? ""),
  ]);
  const payouts = last(state.payouts).map((p) => [`<span class="mono">${esc(p.id)}</span>`, esc(formatMoney(p.amount, p.currency)), esc(p.status), time(p.created)]);
  const deliveries = Object.values(state.deliveries)
    .sort((a, b) => b.seq - a.seq)
    .slice(0, 30)
    .map((d) => [esc(d.event_type), esc(d.status), String(d.attempts.length), esc(d.attempts.at(-1)?.error ?? d.attempts.at(-1)?.status ?? ""), esc(d.note ?? "")]);
  const html = messagePage("Testpay overview", `Webhooks go to ${webhookUrl}. Admin endpoints: GET /admin.`);
  const tables =
    table("Checkout sessions", ["id", "status", "amount", "", "created (UTC)"], sessions) +
    table("Balance transactions", ["id", "type", "amount", "fee", "net", "payout"], txns) +
    table("Payouts", ["id", "amount", "status", "created (UTC)"], payouts) +
    table("Webhook deliveries", ["event", "status", "attempts", "last result", "note"], deliveries);
  return html.replace("</section></main>", `${tables}</section></main>`);
}
