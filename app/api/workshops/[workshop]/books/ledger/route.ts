// GET /api/workshops/[workshop]/books/ledger?period=&status=&kind=&method=&commission=&client=&sort=&page=&pageSize= – the payments ledger, a page of it and the totals per currency (owner, bookkeeper).
import { NextResponse } from "next/server";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { listLedger } from "@/lib/data/ledger";
import { readQuery } from "@/lib/http/respond";
import { ledgerQuerySchema } from "@/lib/schemas/books";

export const GET = withWorkshop({ permission: "ledger.read" }, async (req, { scope }) => {
  return NextResponse.json(await listLedger(scope, readQuery(req, ledgerQuerySchema)));
});
