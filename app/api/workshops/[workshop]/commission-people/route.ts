// GET /api/workshops/[workshop]/commission-people – clients and builders a commission form can choose (owner, builder).
import { NextResponse } from "next/server";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { listCommissionPeople } from "@/lib/data/commissions";

export const GET = withWorkshop({ permission: "commission.write" }, async (_req, { scope }) => {
  return NextResponse.json(await listCommissionPeople(scope));
});
