// GET /api/workshops/[workshop]/books/holdings – money held for commissions whose build has not started, and money earned (owner, bookkeeper).
import { NextResponse } from "next/server";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getHoldings } from "@/lib/data/ledger-holdings";

export const GET = withWorkshop({ permission: "ledger.read" }, async (_req, { scope }) => {
  return NextResponse.json({ holdings: await getHoldings(scope) });
});
