// POST /api/workshops/[workshop]/commissions/[id]/refunds – owner or bookkeeper refunds all or part of a payment (card: pending until the processor confirms).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { readJson } from "@/lib/http/respond";
import { refundPayment } from "@/lib/payments/refunds";
import { idParamSchema } from "@/lib/schemas/ids";
import { refundRequestSchema } from "@/lib/schemas/payment";

const params = z.object({ id: idParamSchema });

export const POST = withWorkshop({ permission: "payment.refund", params }, async (req, { scope, params }) => {
  const input = await readJson(req, refundRequestSchema);
  const refund = await refundPayment(scope, params.id, input);
  // 202: asked of the processor, recorded when its event arrives; 201: returned by the workshop itself.
  return NextResponse.json({ refund }, { status: refund.status === "pending" ? 202 : 201 });
});
