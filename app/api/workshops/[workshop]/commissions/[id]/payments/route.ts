// GET  /api/workshops/[workshop]/commissions/[id]/payments – the deposit and balance invoices and every payment (owner, bookkeeper, the client).
// POST /api/workshops/[workshop]/commissions/[id]/payments – record a payment taken outside the processor (owner, bookkeeper).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getCommissionPayments } from "@/lib/data/card-payments";
import { recordOfflinePayment } from "@/lib/data/payments";
import { readJson } from "@/lib/http/respond";
import { offlinePaymentSchema } from "@/lib/schemas/commission";
import { idParamSchema } from "@/lib/schemas/ids";

const params = z.object({ id: idParamSchema });

export const GET = withWorkshop({ permission: "payment.read", params }, async (_req, { scope, params }) => {
  return NextResponse.json(await getCommissionPayments(scope, params.id));
});

export const POST = withWorkshop({ permission: "payment.record", params }, async (req, { scope, params }) => {
  const input = await readJson(req, offlinePaymentSchema);
  return NextResponse.json(await recordOfflinePayment(scope, params.id, input), { status: 201 });
});
