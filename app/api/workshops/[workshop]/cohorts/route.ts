// GET  /api/workshops/[workshop]/cohorts – the cohorts with builders and progress (owner, bookkeeper: all; builder: theirs).
// POST /api/workshops/[workshop]/cohorts – create a cohort (owner).
import { NextResponse } from "next/server";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { createCohort, listCohorts } from "@/lib/data/cohorts";
import { readJson } from "@/lib/http/respond";
import { cohortCreateSchema } from "@/lib/schemas/cohort";

export const GET = withWorkshop({ permission: "cohort.read" }, async (_req, { scope }) => {
  return NextResponse.json({ cohorts: await listCohorts(scope) });
});

export const POST = withWorkshop({ permission: "cohort.manage" }, async (req, { scope }) => {
  const input = await readJson(req, cohortCreateSchema);
  return NextResponse.json({ cohort: await createCohort(scope, input) }, { status: 201 });
});
