// Sends events to the app's webhook URL, one delivery at a time in order, signed with the webhook
// secret the way the hosted service signs them (`Stripe-Signature: t=…,v1=…`, made at send time),
// retrying failed deliveries with doubling waits.
import Stripe from "stripe";
import type { StripeContext } from "../context";
import { invalid, noSuch } from "../errors";
import { newId } from "../ids";
import type { Delivery, StripeEvent } from "../types";
import { applyRules } from "./rules";

export class WebhookDispatcher {
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<void> | null = null;

  constructor(private readonly ctx: StripeContext) {}

  targetUrl(): string {
    return this.ctx.state.webhook_url ?? this.ctx.opts.webhookUrl;
  }

  private add(event: StripeEvent, status: Delivery["status"], dueMs: number | null, note: string | null): Delivery {
    const s = this.ctx.state;
    const d: Delivery = {
      id: newId("whd", 16),
      event_id: event.id,
      event_type: event.type,
      status,
      note,
      seq: ++s.seq,
      created_at: new Date().toISOString(),
      next_attempt_at: dueMs,
      attempts: [],
    };
    s.deliveries[d.id] = d;
    return d;
  }

  /** Queues the deliveries of a new event after applying the test rules. */
  enqueue(event: StripeEvent): Delivery[] {
    const fx = applyRules(this.ctx.state.rules, event.type);
    const note = fx.notes.length ? fx.notes.join(", ") : null;
    const out: Delivery[] = [];
    for (let i = 0; i < fx.copies; i++) {
      if (fx.drop) out.push(this.add(event, "dropped", null, note));
      else if (fx.hold) out.push(this.add(event, "held", null, note));
      else out.push(this.add(event, "pending", Date.now() + fx.delayMs, note));
    }
    this.ctx.store.changed();
    this.kick();
    return out;
  }

  /** Sends one more delivery of an event that was already sent (or dropped). */
  redeliver(eventId: string): Delivery {
    const event = this.ctx.state.events[eventId];
    if (!event) throw noSuch("event", eventId);
    const d = this.add(event, "pending", Date.now(), "redelivered by admin");
    this.ctx.store.changed();
    this.kick();
    return d;
  }

  /** Lets held deliveries go, newest first ("reverse") or in the order of `eventIds`. */
  release(order: "reverse" | "as_held", eventIds: string[] | null): Delivery[] {
    let held = Object.values(this.ctx.state.deliveries).filter((d) => d.status === "held").sort((a, b) => a.seq - b.seq);
    if (eventIds) {
      const unknown = eventIds.filter((id) => !held.some((d) => d.event_id === id));
      if (unknown.length) throw invalid(`No held deliveries for: ${unknown.join(", ")}`, "event_ids");
      held = eventIds.flatMap((id) => held.filter((d) => d.event_id === id));
    } else if (order === "reverse") held.reverse();
    const now = Date.now();
    for (const d of held) {
      d.status = "pending";
      d.seq = ++this.ctx.state.seq;
      d.next_attempt_at = now;
    }
    this.ctx.store.changed();
    this.kick();
    return held;
  }

  /** Makes every waiting retry (and delay) due now. */
  flush(): number {
    let n = 0;
    for (const d of Object.values(this.ctx.state.deliveries)) {
      if (d.status === "pending") {
        d.next_attempt_at = Date.now();
        n++;
      }
    }
    this.kick();
    return n;
  }

  start(): void {
    if (!this.timer) this.timer = setInterval(() => this.kick(), 25);
  }

  async stop(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    await this.running;
  }

  /** True when nothing is waiting to be sent now or later. */
  idle(): boolean {
    return !this.running && !Object.values(this.ctx.state.deliveries).some((d) => d.status === "pending");
  }

  private kick(): void {
    if (this.running || !this.timer) return;
    this.running = this.drain().finally(() => {
      this.running = null;
    });
  }

  private nextDue(): Delivery | undefined {
    const now = Date.now();
    let best: Delivery | undefined;
    for (const d of Object.values(this.ctx.state.deliveries)) {
      if (d.status !== "pending" || d.next_attempt_at === null || d.next_attempt_at > now) continue;
      if (!best || d.next_attempt_at < best.next_attempt_at! || (d.next_attempt_at === best.next_attempt_at && d.seq < best.seq)) best = d;
    }
    return best;
  }

  private async drain(): Promise<void> {
    for (let d = this.nextDue(); d && this.timer; d = this.nextDue()) await this.attempt(d);
  }

  private async attempt(d: Delivery): Promise<void> {
    const { opts } = this.ctx;
    const event = this.ctx.state.events[d.event_id];
    if (!event) {
      d.status = "failed";
      return;
    }
    const url = this.targetUrl();
    const pending = Object.values(this.ctx.state.deliveries).filter((x) => x.event_id === d.event_id && x.status !== "delivered").length;
    const payload = JSON.stringify({ ...event, pending_webhooks: pending }, null, 2);
    const signature = Stripe.webhooks.generateTestHeaderString({ payload, secret: opts.webhookSecret });
    let status: number | null = null;
    let error: string | null = null;
    try {
      const res = await fetch(url, {
        method: "POST",
        headers: { "Content-Type": "application/json; charset=utf-8", "Stripe-Signature": signature, "User-Agent": "Scalewright-Fake-Stripe/1.0" },
        body: payload,
        signal: AbortSignal.timeout(opts.webhookTimeoutMs),
      });
      status = res.status;
      await res.arrayBuffer().catch(() => undefined);
      if (!res.ok) error = `HTTP ${res.status}`;
    } catch (err) {
      const cause = (err as { cause?: { code?: string } }).cause;
      error = cause?.code ?? (err instanceof Error ? err.message : String(err));
    }
    // The state may have been reset while we waited.
    if (this.ctx.state.deliveries[d.id] !== d) return;
    d.attempts.push({ at: new Date().toISOString(), url, status, error });
    if (!error) {
      d.status = "delivered";
      d.next_attempt_at = null;
    } else if (d.attempts.length >= opts.maxAttempts) {
      d.status = "failed";
      d.next_attempt_at = null;
      this.ctx.log(`webhook ${event.type} ${event.id} failed after ${d.attempts.length} attempts (${error})`);
    } else {
      const wait = Math.min(opts.retryBaseMs * 2 ** (d.attempts.length - 1), opts.retryMaxMs);
      d.next_attempt_at = Date.now() + wait;
    }
    this.ctx.store.changed();
  }
}
