// Delivers the outbox through the Resend SDK. Safe to run in several processes at once: each batch
// is claimed with SELECT … FOR UPDATE SKIP LOCKED, and every message carries its own idempotency
// key, so even a message re-sent after a crash mid-delivery reaches the recipient once.
import { renderEmail } from "@/emails/render";
import { claimDueMessages, markFailed, markRetry, markSent, type ClaimedMessage } from "@/lib/data/outbox";
import { mailFrom, resendClient } from "@/lib/services/resend";
import { TEMPLATE_NAMES, type TemplateName } from "./templates";
import { backoffPolicyFromEnv, isRetryable, nextDelayMs, type BackoffPolicy } from "./backoff";

export interface WorkerOptions {
  batchSize: number;
  /** How long a claimed message stays ours before another worker may take it over. */
  lockMs: number;
  /** Give up on one provider call after this long (the provider may be slow, not down). */
  requestTimeoutMs: number;
  policy: BackoffPolicy;
  log: (line: string) => void;
}

export function workerOptionsFromEnv(env: Record<string, string | undefined> = process.env): WorkerOptions {
  const timeout = Number(env.OUTBOX_REQUEST_TIMEOUT_MS) > 0 ? Number(env.OUTBOX_REQUEST_TIMEOUT_MS) : 10_000;
  return {
    batchSize: 20,
    lockMs: Math.max(60_000, timeout * 3),
    requestTimeoutMs: timeout,
    policy: backoffPolicyFromEnv(env),
    log: (line) => console.log(`[outbox] ${line}`),
  };
}

export type DeliveryOutcome = "sent" | "retry" | "failed";

async function deliver(resend: ReturnType<typeof resendClient>, m: ClaimedMessage, opts: WorkerOptions): Promise<DeliveryOutcome> {
  if (!TEMPLATE_NAMES.includes(m.template as TemplateName)) {
    await markFailed(m.id, `unknown template ${m.template}`);
    return "failed";
  }
  let rendered: { html: string; text: string };
  try {
    rendered = await renderEmail(m.template as TemplateName, m.props);
  } catch (err) {
    // A template that cannot render will not render on a retry either.
    await markFailed(m.id, `could not render: ${err instanceof Error ? err.message : String(err)}`);
    return "failed";
  }

  let statusCode: number | null = null;
  let message: string;
  try {
    const { data, error } = await resend.emails.send(
      { from: mailFrom(), to: m.to, subject: m.subject, html: rendered.html, text: rendered.text },
      { idempotencyKey: m.idempotencyKey, signal: AbortSignal.timeout(opts.requestTimeoutMs) },
    );
    if (data) {
      await markSent(m.id, data.id);
      return "sent";
    }
    statusCode = error?.statusCode ?? null;
    message = `${error?.name ?? "error"}: ${error?.message ?? "no answer"}`;
  } catch (err) {
    message = `request failed: ${err instanceof Error ? err.message : String(err)}`;
  }

  const label = `${message}${statusCode ? ` (HTTP ${statusCode})` : ""}`;
  if (!isRetryable(statusCode) || m.attempts >= opts.policy.maxAttempts) {
    await markFailed(m.id, `${label}; gave up after ${m.attempts} attempt${m.attempts === 1 ? "" : "s"}`);
    opts.log(`#${m.id} to ${m.to} failed for good: ${label}`);
    return "failed";
  }
  const delay = nextDelayMs(m.attempts, opts.policy);
  await markRetry(m.id, label, new Date(Date.now() + delay));
  opts.log(`#${m.id} to ${m.to}: ${label}; attempt ${m.attempts}, next in ${Math.round(delay / 100) / 10} s`);
  return "retry";
}

/** Claims one batch of due messages and tries each once. Returns what happened to each. */
export async function deliverDueBatch(opts: WorkerOptions = workerOptionsFromEnv()): Promise<Record<DeliveryOutcome, number>> {
  const counts: Record<DeliveryOutcome, number> = { sent: 0, retry: 0, failed: 0 };
  const batch = await claimDueMessages(opts.batchSize, opts.lockMs);
  if (batch.length === 0) return counts;
  const resend = resendClient();
  // A few at a time: enough to drain a queue quickly, few enough to be gentle on the provider.
  const queue = [...batch];
  await Promise.all(
    Array.from({ length: Math.min(4, queue.length) }, async () => {
      for (let m = queue.shift(); m; m = queue.shift()) counts[await deliver(resend, m, opts)] += 1;
    }),
  );
  return counts;
}

/** Runs until `signal` aborts: a batch, then a short pause when there was nothing to do. */
export async function runWorker(signal: AbortSignal, pollMs = 500, opts: WorkerOptions = workerOptionsFromEnv()): Promise<void> {
  while (!signal.aborted) {
    let busy = false;
    try {
      const c = await deliverDueBatch(opts);
      busy = c.sent + c.retry + c.failed > 0;
      if (c.sent) opts.log(`sent ${c.sent}`);
    } catch (err) {
      // The database may be restarting: wait and try again rather than exit.
      opts.log(`batch failed: ${err instanceof Error ? err.message : String(err)}`);
    }
    if (!busy) await new Promise((r) => setTimeout(r, pollMs));
  }
}
