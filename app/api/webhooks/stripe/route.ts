// POST /api/webhooks/stripe – the payment processor's events: no session, verified by signature on the raw body.
import { NextResponse } from "next/server";
import { AppError } from "@/lib/http/errors";
import { errorResponse } from "@/lib/http/respond";
import { PROCESSOR_DOWN_MESSAGE, isProcessorUnavailable } from "@/lib/payments/processor-errors";
import { handleStripeEvent } from "@/lib/payments/stripe-events";
import { verifyStripeWebhook } from "@/lib/services/stripe";

export async function POST(req: Request): Promise<Response> {
  // The signature covers the exact bytes sent: read them untouched.
  const raw = Buffer.from(await req.arrayBuffer());
  let event;
  try {
    event = verifyStripeWebhook(raw, req.headers.get("stripe-signature"));
  } catch {
    return errorResponse(new AppError("bad_request", "The webhook signature is missing or does not match this body."));
  }
  try {
    // Any failure answers 5xx, and the processor sends the event again later.
    return NextResponse.json({ received: true, outcome: await handleStripeEvent(event) });
  } catch (err) {
    return errorResponse(isProcessorUnavailable(err) ? new AppError("unavailable", PROCESSOR_DOWN_MESSAGE, undefined, 30) : err);
  }
}
