// The /v1 API front door: planned outages, the secret-key check, form parsing, Idempotency-Key
// replay, and Stripe-shaped errors around each resource handler.
import { createHash } from "node:crypto";
import type { IncomingMessage, ServerResponse } from "node:http";
import type { Outage } from "../kit/serve";
import { readBody, Router, sendJson } from "../kit/http";
import type { StripeContext } from "./context";
import { StripeFakeError } from "./errors";
import { newId, nowSeconds } from "./ids";
import { parseForm, type Params } from "./params";

export type ApiHandler = (params: Params, path: Record<string, string>) => unknown;

export class ApiRoutes {
  readonly list: { method: string; pattern: string; handler: ApiHandler }[] = [];
  get(pattern: string, handler: ApiHandler): this {
    this.list.push({ method: "GET", pattern, handler });
    return this;
  }
  post(pattern: string, handler: ApiHandler): this {
    this.list.push({ method: "POST", pattern, handler });
    return this;
  }
}

const IDEMPOTENCY_TTL_SECONDS = 24 * 3600;

function authError(message: string): StripeFakeError {
  return new StripeFakeError(401, "invalid_request_error", message);
}

function checkKey(req: IncomingMessage, secretKey: string): void {
  const header = req.headers.authorization ?? "";
  let key = "";
  if (header.startsWith("Bearer ")) key = header.slice(7).trim();
  else if (header.startsWith("Basic ")) key = Buffer.from(header.slice(6), "base64").toString("utf8").split(":")[0] ?? "";
  if (!key) {
    throw authError(
      "You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY').",
    );
  }
  if (key !== secretKey) {
    const shown = key.length > 8 ? `${key.slice(0, 8)}${"*".repeat(Math.max(0, key.length - 12))}${key.slice(-4)}` : key;
    throw authError(`Invalid API Key provided: ${shown}`);
  }
}

export function createApi(ctx: StripeContext, outage: Outage, routes: ApiRoutes) {
  const router = new Router<ApiHandler>();
  for (const r of routes.list) router.on(r.method, r.pattern, r.handler);

  const pruneIdempotency = () => {
    const cutoff = nowSeconds() - IDEMPOTENCY_TTL_SECONDS;
    for (const [k, v] of Object.entries(ctx.state.idempotency)) if (v.created < cutoff) delete ctx.state.idempotency[k];
  };

  return async function handleApi(req: IncomingMessage, res: ServerResponse, url: URL): Promise<void> {
    const requestId = newId("req", 14);
    const headers: Record<string, string> = { "Request-Id": requestId, "Stripe-Version": String(req.headers["stripe-version"] ?? "") };
    const fail = (err: StripeFakeError) => sendJson(res, err.status, err.toBody(), headers);
    try {
      if (outage.unavailable) {
        throw new StripeFakeError(503, "api_error", "The fake payment processor is unavailable right now (planned outage). Try again later.");
      }
      checkKey(req, ctx.opts.secretKey);
      const body = req.method === "POST" ? (await readBody(req)).toString("utf8") : "";
      const params = parseForm(req.method === "POST" ? body : url.search.slice(1));

      const idemKey = req.method === "POST" ? (req.headers["idempotency-key"] as string | undefined) : undefined;
      const fingerprint = createHash("sha256").update(`${req.method} ${url.pathname}\n${body}`).digest("hex");
      if (idemKey) {
        headers["Idempotency-Key"] = idemKey;
        const seen = ctx.state.idempotency[`${ctx.opts.secretKey}:${idemKey}`];
        if (seen) {
          if (seen.fingerprint !== fingerprint) {
            throw new StripeFakeError(
              400,
              "idempotency_error",
              `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${idemKey}' if you meant to execute a different request.`,
            );
          }
          sendJson(res, seen.status, seen.body, { ...headers, "Idempotent-Replayed": "true" });
          return;
        }
      }

      const matched = router.match(req.method ?? "GET", url.pathname);
      if (!matched) {
        throw new StripeFakeError(404, "invalid_request_error", `Unrecognized request URL (${req.method}: ${url.pathname}).`);
      }
      const result = matched.handler(params, matched.params);
      // Only completed requests are remembered: a request that failed validation may be retried.
      if (idemKey) {
        pruneIdempotency();
        ctx.state.idempotency[`${ctx.opts.secretKey}:${idemKey}`] = { fingerprint, status: 200, body: result, created: nowSeconds() };
      }
      ctx.store.changed();
      sendJson(res, 200, result, headers);
    } catch (err) {
      if (err instanceof StripeFakeError) return fail(err);
      console.error("[stripe fake] unexpected error", err);
      fail(new StripeFakeError(500, "api_error", "The fake payment processor failed unexpectedly."));
    }
  };
}
