// GET  /api/workshops/[workshop]/commissions – the commissions the caller may see: filter, search, sort, page.
// POST /api/workshops/[workshop]/commissions – open a commission (owner/builder for a client; a client for themselves).
import { NextResponse } from "next/server";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { createCommission, listCommissions } from "@/lib/data/commissions";
import { readJson, readQuery } from "@/lib/http/respond";
import { commissionCreateSchema, commissionListQuerySchema } from "@/lib/schemas/commission";

export const GET = withWorkshop({ permission: "commission.read" }, async (req, { scope }) => {
  return NextResponse.json(await listCommissions(scope, readQuery(req, commissionListQuerySchema)));
});

export const POST = withWorkshop({ permission: "commission.create" }, async (req, { scope }) => {
  const input = await readJson(req, commissionCreateSchema);
  return NextResponse.json({ commission: await createCommission(scope, input) }, { status: 201 });
});
