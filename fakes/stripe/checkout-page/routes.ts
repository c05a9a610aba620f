// GET/POST /pay/:id — the hosted checkout page and its form, as a browser uses them.
import type { IncomingMessage, ServerResponse } from "node:http";
import { readBody, redirect, type Router, sendHtml } from "../../kit/http";
import type { Outage } from "../../kit/serve";
import type { StripeContext } from "../context";
import { parseForm } from "../params";
import { attemptPayment } from "../payments";
import { checkCard, parseExpiry } from "../test-cards";
import { checkoutPage, closedPage, messagePage, type FormState } from "./render";

export function registerCheckoutPage(router: Router, ctx: StripeContext, outage: Outage): void {
  const find = (res: ServerResponse, id: string) => {
    if (outage.unavailable) {
      sendHtml(res, 503, messagePage("Temporarily unavailable", "The payment page cannot be reached right now. Try again in a moment."));
      return null;
    }
    const s = ctx.state.checkout_sessions[id];
    if (!s) {
      sendHtml(res, 404, messagePage("Checkout not found", "This payment link is not valid."));
      return null;
    }
    return s;
  };

  router.on("GET", "/pay/:id", (_req: IncomingMessage, res: ServerResponse, { id }) => {
    const s = find(res, id!);
    if (!s) return;
    if (s.status !== "open") return sendHtml(res, 200, closedPage(s));
    sendHtml(res, 200, checkoutPage(s, ctx.state.line_items[s.id] ?? []));
  });

  router.on("POST", "/pay/:id", async (req: IncomingMessage, res: ServerResponse, { id }) => {
    const body = parseForm((await readBody(req, 64 * 1024)).toString("utf8"));
    const s = find(res, id!);
    if (!s) return;
    // A second submit after success (double click, back button) lands on the same success page.
    if (s.status === "complete") return redirect(res, s.success_url.replace("{CHECKOUT_SESSION_ID}", s.id));
    if (s.status !== "open") return sendHtml(res, 410, closedPage(s));
    const values = Object.fromEntries(
      ["email", "card_name", "card_number", "card_exp", "card_cvc"].map((k) => [k, typeof body[k] === "string" ? (body[k] as string).trim() : ""]),
    );
    const items = ctx.state.line_items[s.id] ?? [];
    const form: FormState = { values: { ...values, card_cvc: "" }, error: null, fieldErrors: {} };
    const email = s.customer_email ?? values.email!;
    if (!s.customer_email && !/^[^@\s]+@[^@\s]+\.[^@\s]+$/.test(email)) form.fieldErrors.email = "Enter the e-mail address for the receipt.";
    const card = checkCard({ number: values.card_number!, exp: values.card_exp!, cvc: values.card_cvc! });
    if (!card.valid) form.fieldErrors[card.field] = card.message;
    if (!card.valid || Object.keys(form.fieldErrors).length > 0) {
      form.error = "Check the highlighted fields.";
      return sendHtml(res, 422, checkoutPage(s, items, form));
    }
    const exp = parseExpiry(values.card_exp!)!;
    const result = attemptPayment(
      ctx,
      s,
      { name: values.card_name || null, email: email || null, last4: card.last4, exp_month: exp.month, exp_year: exp.year },
      card.outcome,
    );
    if (!result.ok) {
      form.error = `${result.message} Nothing was charged; try another card.`;
      return sendHtml(res, 402, checkoutPage(s, items, form));
    }
    redirect(res, s.success_url.replace("{CHECKOUT_SESSION_ID}", s.id));
  });
}
