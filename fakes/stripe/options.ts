// Settings of the Stripe fake, from the environment (server.ts) or given directly (tests).
import { join } from "node:path";

export interface StripeFakeOptions {
  /** 0 = a free port (tests). */
  port: number;
  secretKey: string;
  webhookSecret: string;
  /** Where events are POSTed; the app's webhook route. */
  webhookUrl: string;
  /** Base URL of the fake as a browser reaches it (hosted checkout links); defaults to the listen URL. */
  publicUrl: string | null;
  /** Folder for state.json; null keeps state in memory only. */
  dataDir: string | null;
  /** First retry after this many ms, doubling up to retryMaxMs, at most maxAttempts tries in all. */
  retryBaseMs: number;
  retryMaxMs: number;
  maxAttempts: number;
  webhookTimeoutMs: number;
  /** Seconds after creation a balance transaction becomes available (and can be paid out). */
  availableAfterSeconds: number;
  /** Automatic payouts every N seconds; 0 = only when POST /admin/payouts/run asks. */
  payoutEverySeconds: number;
  quiet: boolean;
}

const num = (v: string | undefined, fallback: number) => (v !== undefined && v !== "" && Number.isFinite(Number(v)) ? Number(v) : fallback);

/** Webhooks go server to server: 127.0.0.1 avoids a localhost lookup, and the app listens there. */
function defaultWebhookUrl(env: NodeJS.ProcessEnv): string {
  const app = (env.APP_URL ?? "http://localhost:3000").replace(/\/$/, "");
  return `${app.replace("//localhost", "//127.0.0.1")}/api/webhooks/stripe`;
}

export function optionsFromEnv(env: NodeJS.ProcessEnv = process.env): StripeFakeOptions {
  const fakesDir = env.FAKES_DATA_DIR ?? join(env.DATA_DIR ?? ".data", "fakes");
  return {
    port: num(env.FAKE_STRIPE_PORT, 3411),
    secretKey: env.STRIPE_SECRET_KEY ?? "sk_test_fake_local_key",
    webhookSecret: env.STRIPE_WEBHOOK_SECRET ?? "whsec_fake_local_secret",
    webhookUrl: env.STRIPE_WEBHOOK_URL || defaultWebhookUrl(env),
    publicUrl: env.FAKE_STRIPE_PUBLIC_URL || null,
    dataDir: join(fakesDir, "stripe"),
    retryBaseMs: num(env.FAKE_STRIPE_RETRY_BASE_MS, 1000),
    retryMaxMs: num(env.FAKE_STRIPE_RETRY_MAX_MS, 60_000),
    maxAttempts: num(env.FAKE_STRIPE_MAX_ATTEMPTS, 8),
    webhookTimeoutMs: num(env.FAKE_STRIPE_WEBHOOK_TIMEOUT_MS, 10_000),
    availableAfterSeconds: num(env.FAKE_STRIPE_AVAILABLE_AFTER_SECONDS, 0),
    payoutEverySeconds: num(env.FAKE_STRIPE_PAYOUT_EVERY_SECONDS, 0),
    quiet: false,
  };
}

/** Test defaults: memory state, fast retries, no logging. */
export function testOptions(overrides: Partial<StripeFakeOptions> = {}): StripeFakeOptions {
  return {
    port: 0,
    secretKey: "sk_test_fake_in_process",
    webhookSecret: "whsec_fake_in_process",
    webhookUrl: "http://127.0.0.1:9/unused",
    publicUrl: null,
    dataDir: null,
    retryBaseMs: 40,
    retryMaxMs: 400,
    maxAttempts: 6,
    webhookTimeoutMs: 2000,
    availableAfterSeconds: 0,
    payoutEverySeconds: 0,
    quiet: true,
    ...overrides,
  };
}
