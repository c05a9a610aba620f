// POST /api/workshops/[workshop]/commissions/[id]/checkout – the client opens (or gets back) the card checkout for the deposit or balance.
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { readJson } from "@/lib/http/respond";
import { startCheckout } from "@/lib/payments/stripe-checkout";
import { idParamSchema } from "@/lib/schemas/ids";
import { checkoutStartSchema } from "@/lib/schemas/payment";

const params = z.object({ id: idParamSchema });

export const POST = withWorkshop({ permission: "payment.pay", params }, async (req, { scope, params }) => {
  const { kind } = await readJson(req, checkoutStartSchema);
  const checkout = await startCheckout(scope, params.id, kind);
  return NextResponse.json({ checkout }, { status: checkout.reused ? 200 : 201 });
});
