// GET   /api/workshops/[workshop]/commissions/[id] – one commission with payments, stage line and open moves.
// PATCH /api/workshops/[workshop]/commissions/[id] – change title, target date; owner: price, deposit, builder.
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getCommissionDetail } from "@/lib/data/commission-detail";
import { updateCommission } from "@/lib/data/commissions";
import { readJson } from "@/lib/http/respond";
import { commissionPatchSchema } from "@/lib/schemas/commission";
import { idParamSchema } from "@/lib/schemas/ids";

const params = z.object({ id: idParamSchema });

export const GET = withWorkshop({ permission: "commission.read", params }, async (_req, { scope, params }) => {
  return NextResponse.json({ commission: await getCommissionDetail(scope, params.id) });
});

export const PATCH = withWorkshop({ permission: "commission.write", params }, async (req, { scope, params }) => {
  const patch = await readJson(req, commissionPatchSchema);
  await updateCommission(scope, params.id, patch);
  return NextResponse.json({ commission: await getCommissionDetail(scope, params.id) });
});
