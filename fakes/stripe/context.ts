// What every part of the Stripe fake shares: settings, the persisted state, and the event emitter.
import type { JsonStore } from "../kit/json-store";
import type { StripeFakeOptions } from "./options";
import type { StripeEvent, StripeState } from "./types";

export interface EmitOptions {
  previous?: Record<string, unknown>;
  /** false records the event (GET /v1/events) but sends no webhook: "the processor did not tell the app". */
  notify?: boolean;
}

export interface StripeContext {
  readonly opts: StripeFakeOptions;
  readonly store: JsonStore<StripeState>;
  readonly state: StripeState;
  /** Base URL a browser uses for the hosted checkout page. */
  publicUrl(): string;
  /** Records an event with a snapshot of `object` and queues its webhook deliveries. */
  emit(type: string, object: unknown, options?: EmitOptions): StripeEvent;
  log(message: string): void;
}

/** Finds any stored object by its id prefix (for `expand`). */
export function findObject(state: StripeState, id: string): unknown {
  const prefix = id.slice(0, id.indexOf("_") + 1);
  const table: Record<string, Record<string, unknown>> = {
    "cs_": state.checkout_sessions,
    "pi_": state.payment_intents,
    "ch_": state.charges,
    "re_": state.refunds,
    "txn_": state.balance_transactions,
    "po_": state.payouts,
    "evt_": state.events,
  };
  return table[prefix]?.[id];
}

/**
 * Applies `expand` paths ("payment_intent", "latest_charge.balance_transaction", "data.source")
 * to a copy of `obj`, replacing id strings with the objects they name.
 */
export function expand<T>(state: StripeState, obj: T, paths: string[]): T {
  if (paths.length === 0) return obj;
  const copy = structuredClone(obj) as Record<string, unknown>;
  for (const path of paths) expandPath(state, copy, path.split("."));
  return copy as T;
}

function expandPath(state: StripeState, target: unknown, parts: string[]): void {
  if (!target || typeof target !== "object" || parts.length === 0) return;
  const [head, ...rest] = parts as [string, ...string[]];
  const holder = target as Record<string, unknown>;
  if (head === "data" && Array.isArray(holder.data)) {
    for (const item of holder.data) expandPath(state, item, rest);
    return;
  }
  if (head === "line_items" && holder.object === "checkout.session") {
    const items = state.line_items[String(holder.id)] ?? [];
    holder.line_items = { object: "list", data: structuredClone(items), has_more: false, url: `/v1/checkout/sessions/${String(holder.id)}/line_items` };
    return;
  }
  const value = holder[head];
  if (typeof value === "string") {
    const found = findObject(state, value);
    if (found) holder[head] = structuredClone(found);
  }
  if (rest.length > 0) expandPath(state, holder[head], rest);
}
