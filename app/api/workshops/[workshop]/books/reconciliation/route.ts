// GET /api/workshops/[workshop]/books/reconciliation – every month with entries and its reconciliation state (owner, bookkeeper).
import { NextResponse } from "next/server";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { listReconciliationPeriods } from "@/lib/data/reconciliation-view";

export const GET = withWorkshop({ permission: "reconciliation.manage" }, async (_req, { scope }) => {
  return NextResponse.json({ periods: await listReconciliationPeriods(scope) });
});
