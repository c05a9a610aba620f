// GET /api/workshops/[workshop]/books/summary – month by month: received, refunded, fees, net, earned, held, reconciliation state (owner, bookkeeper).
import { NextResponse } from "next/server";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getMonthlySummary } from "@/lib/data/ledger-holdings";

export const GET = withWorkshop({ permission: "ledger.read" }, async (_req, { scope }) => {
  return NextResponse.json({ months: await getMonthlySummary(scope) });
});
