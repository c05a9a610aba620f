// POST /api/workshops/[workshop]/commissions/[id]/transitions/[historyId]/signoff – the owner signs off a builder's move; the client is told.
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { signOffStage } from "@/lib/data/stage-transitions";
import { idParamSchema } from "@/lib/schemas/ids";

const params = z.object({ id: idParamSchema, historyId: idParamSchema });

export const POST = withWorkshop({ permission: "commission.signoff", params }, async (_req, { scope, params }) => {
  return NextResponse.json(await signOffStage(scope, params.id, params.historyId));
});
