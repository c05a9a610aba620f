// The Stripe fake as an object: build it with options, listen, close. server.ts runs it from the
// environment; tests start their own on a free port to control it.
import type { IncomingMessage, ServerResponse } from "node:http";
import { join } from "node:path";
import { openJsonStore } from "../kit/json-store";
import { dispatch, Router, sendHtml, sendJson } from "../kit/http";
import { listen, Outage, type RunningServer } from "../kit/serve";
import { registerAdmin } from "./admin";
import { ApiRoutes, createApi } from "./api";
import { registerCheckoutPage } from "./checkout-page/routes";
import type { StripeContext } from "./context";
import { dashboardPage } from "./dashboard";
import { newId, nowSeconds } from "./ids";
import type { StripeFakeOptions } from "./options";
import { runPayouts, settleBalance } from "./payout-run";
import { expireDueSessions, registerCheckoutSessions } from "./resources/checkout-sessions";
import { registerPaymentReads } from "./resources/payments-read";
import { freshState, type StripeEvent } from "./types";
import { WebhookDispatcher } from "./webhooks/dispatcher";
import Stripe from "stripe";

export interface StripeFake {
  readonly url: string;
  readonly port: number;
  readonly ctx: StripeContext;
  readonly webhooks: WebhookDispatcher;
  close(): Promise<void>;
}

export async function startStripeFake(opts: StripeFakeOptions): Promise<StripeFake> {
  const store = openJsonStore(opts.dataDir ? join(opts.dataDir, "state.json") : null, freshState);
  let running: RunningServer | null = null;
  const outage = new Outage(() => running);
  // eslint-disable-next-line prefer-const
  let webhooks: WebhookDispatcher;
  const ctx: StripeContext = {
    opts,
    store,
    get state() {
      return store.state;
    },
    publicUrl: () => opts.publicUrl ?? running?.url ?? `http://127.0.0.1:${opts.port}`,
    emit(type, object, options = {}) {
      const event: StripeEvent = {
        id: newId("evt"),
        object: "event",
        api_version: Stripe.API_VERSION,
        created: nowSeconds(),
        data: { object: structuredClone(object), ...(options.previous ? { previous_attributes: options.previous } : {}) },
        livemode: false,
        pending_webhooks: options.notify === false ? 0 : 1,
        request: { id: null, idempotency_key: null },
        type,
      };
      store.state.events[event.id] = event;
      if (options.notify !== false) webhooks.enqueue(event);
      store.changed();
      return event;
    },
    log: (m) => {
      if (!opts.quiet) console.log(`[stripe fake] ${m}`);
    },
  };
  webhooks = new WebhookDispatcher(ctx);

  const routes = new ApiRoutes();
  registerCheckoutSessions(routes, ctx);
  registerPaymentReads(routes, ctx);
  const api = createApi(ctx, outage, routes);

  const router = new Router();
  router.on("GET", "/health", (_req, res) => sendJson(res, 200, { ok: true, service: "stripe-fake" }));
  router.on("GET", "/", (_req, res) => sendHtml(res, 200, dashboardPage(ctx.state, webhooks.targetUrl())));
  registerCheckoutPage(router, ctx, outage);
  registerAdmin(router, ctx, outage, webhooks, () => undefined);

  const handle = async (req: IncomingMessage, res: ServerResponse) => {
    const url = new URL(req.url ?? "/", "http://fake.local");
    if (url.pathname.startsWith("/v1/")) return api(req, res, url);
    if (!(await dispatch(router, req, res, url))) sendJson(res, 404, { error: { type: "invalid_request_error", message: `Nothing at ${req.method} ${url.pathname}` } });
  };

  running = await listen(handle, opts.port);
  webhooks.start();
  // The fake's clock: sessions expire, balances become available, automatic payouts.
  let lastPayout = Date.now();
  const clock = setInterval(() => {
    expireDueSessions(ctx);
    settleBalance(ctx);
    if (opts.payoutEverySeconds > 0 && Date.now() - lastPayout >= opts.payoutEverySeconds * 1000) {
      lastPayout = Date.now();
      runPayouts(ctx, null, true);
    }
  }, 1000);

  const server = running;
  return {
    url: server.url,
    port: server.port,
    ctx,
    webhooks,
    async close() {
      clearInterval(clock);
      outage.end(false);
      await webhooks.stop();
      store.flush();
      await server.close();
    },
  };
}
