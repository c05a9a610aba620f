// The app's Stripe client, configured from the environment. Locally (and in tests) it talks to
// fakes/stripe over plain HTTP on 127.0.0.1; in production the same variables point at the API.
import Stripe from "stripe";
import { z } from "zod";

const StripeEnv = z.object({
  STRIPE_SECRET_KEY: z.string().startsWith("sk_", "must be a secret key (sk_…)"),
  STRIPE_WEBHOOK_SECRET: z.string().startsWith("whsec_", "must be a webhook signing secret (whsec_…)"),
  STRIPE_API_HOST: z.string().min(1).default("127.0.0.1"),
  STRIPE_API_PORT: z.coerce.number().int().min(1).max(65535).default(3411),
  STRIPE_API_PROTOCOL: z.enum(["http", "https"]).default("http"),
  // One retry is safe: the SDK sends an Idempotency-Key with every POST.
  STRIPE_MAX_NETWORK_RETRIES: z.coerce.number().int().min(0).max(3).default(1),
  STRIPE_TIMEOUT_MS: z.coerce.number().int().min(500).max(80_000).default(10_000),
});

export type StripeSettings = z.infer<typeof StripeEnv>;

/** Reads and checks the Stripe variables; a missing or malformed one names itself in the error. */
export function stripeSettings(env: Record<string, string | undefined> = process.env): StripeSettings {
  const parsed = StripeEnv.safeParse(env);
  if (!parsed.success) {
    const what = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
    throw new Error(`Stripe settings are not valid (${what}). See .env.example.`);
  }
  return parsed.data;
}

/** A new client for these settings (tests build their own; the app uses `stripe()`). */
export function createStripeClient(settings: StripeSettings = stripeSettings()): Stripe {
  return new Stripe(settings.STRIPE_SECRET_KEY, {
    host: settings.STRIPE_API_HOST,
    port: settings.STRIPE_API_PORT,
    protocol: settings.STRIPE_API_PROTOCOL,
    maxNetworkRetries: settings.STRIPE_MAX_NETWORK_RETRIES,
    timeout: settings.STRIPE_TIMEOUT_MS,
    telemetry: false,
    appInfo: { name: "Scalewright" },
  });
}

let shared: Stripe | null = null;

/** The app's shared client. */
export function stripe(): Stripe {
  shared ??= createStripeClient();
  return shared;
}

/**
 * Verifies a webhook on its raw body and returns the event; throws Stripe's
 * StripeSignatureVerificationError when the signature is missing, wrong or too old.
 */
export function verifyStripeWebhook(rawBody: string | Buffer, signature: string | null, settings = stripeSettings()): Stripe.Event {
  return Stripe.webhooks.constructEvent(rawBody, signature ?? "", settings.STRIPE_WEBHOOK_SECRET);
}
