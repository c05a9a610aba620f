// What a failed call to the payment processor means for the person who asked: the service is down
// or busy (503, try again; nothing was stored), or it refused the request (409 with its reason).
import Stripe from "stripe";
import { AppError } from "@/lib/http/errors";

const RETRY_AFTER_SECONDS = 30;

export const PROCESSOR_DOWN_MESSAGE =
  "The payment service is not answering right now. Nothing was charged and nothing was recorded; try again in a minute.";

/** True for errors that say "try again later": no connection, a 5xx, a timeout, rate limiting. */
export function isProcessorUnavailable(err: unknown): boolean {
  if (!(err instanceof Stripe.errors.StripeError)) return false;
  if (err.type === "StripeConnectionError" || err.type === "StripeAPIError" || err.type === "StripeRateLimitError") return true;
  return (err.statusCode ?? 0) >= 500;
}

/**
 * Maps a processor error to the app's error type; anything that is not the processor's (or is our
 * own misconfiguration, such as a wrong key) is rethrown as it is and answers 500.
 */
export function processorError(err: unknown): never {
  if (isProcessorUnavailable(err)) throw new AppError("unavailable", PROCESSOR_DOWN_MESSAGE, undefined, RETRY_AFTER_SECONDS);
  if (err instanceof Stripe.errors.StripeIdempotencyError) {
    throw new AppError("conflict", "This request was already made with other details. Refresh the page and try again.");
  }
  if (err instanceof Stripe.errors.StripeInvalidRequestError || err instanceof Stripe.errors.StripeCardError) {
    throw new AppError("conflict", `The payment service refused this: ${err.message}`);
  }
  throw err;
}

/** Runs one processor call, mapping its failure with `processorError`. */
export async function callProcessor<T>(fn: () => Promise<T>): Promise<T> {
  try {
    return await fn();
  } catch (err) {
    processorError(err);
  }
}
