// POST /api/bench/stripe-signature – benchmark only: the webhook's signature check on the raw body
// and nothing else (the floor of the webhook bench): 200 when it verifies, 400 when not. A 404
// unless the bench's own server has BENCH_FLOOR_TOKEN and the request carries it (lib/http/bench-floor.ts).
import { NextResponse } from "next/server";
import { benchFloorRoute } from "@/lib/http/bench-floor";
import { AppError } from "@/lib/http/errors";
import { verifyStripeWebhook } from "@/lib/services/stripe";

export const POST = benchFloorRoute(async (req) => {
  const raw = Buffer.from(await req.arrayBuffer());
  try {
    verifyStripeWebhook(raw, req.headers.get("stripe-signature"));
  } catch {
    throw new AppError("bad_request", "The webhook signature is missing or does not match this body.");
  }
  return NextResponse.json({ received: true });
});
