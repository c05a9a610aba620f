// POST /api/workshops/[workshop]/commissions/[id]/payments – record a payment taken outside the processor (owner, bookkeeper).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { recordOfflinePayment } from "@/lib/data/payments";
import { readJson } from "@/lib/http/respond";
import { offlinePaymentSchema } from "@/lib/schemas/commission";
import { idParamSchema } from "@/lib/schemas/ids";

const params = z.object({ id: idParamSchema });

export const POST = withWorkshop({ permission: "payment.record", params }, async (req, { scope, params }) => {
  const input = await readJson(req, offlinePaymentSchema);
  return NextResponse.json(await recordOfflinePayment(scope, params.id, input), { status: 201 });
});
