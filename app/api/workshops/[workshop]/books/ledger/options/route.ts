// GET /api/workshops/[workshop]/books/ledger/options – what the ledger's filters offer: months, clients and commissions with payments (owner, bookkeeper).
import { NextResponse } from "next/server";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { ledgerFilterOptions } from "@/lib/data/ledger";

export const GET = withWorkshop({ permission: "ledger.read" }, async (_req, { scope }) => {
  return NextResponse.json(await ledgerFilterOptions(scope));
});
