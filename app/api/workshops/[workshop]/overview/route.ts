// GET /api/workshops/[workshop]/overview?cohort=&upcomingDays= – workload, time in stage, overdue, deposits, cohorts (owner, bookkeeper).
import { NextResponse } from "next/server";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getOverview } from "@/lib/data/overview";
import { readQuery } from "@/lib/http/respond";
import { overviewQuerySchema } from "@/lib/schemas/overview";

export const GET = withWorkshop({ permission: "overview.read" }, async (req, { scope }) => {
  return NextResponse.json({ overview: await getOverview(scope, readQuery(req, overviewQuerySchema)) });
});
