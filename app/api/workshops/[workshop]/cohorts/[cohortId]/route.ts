// GET    /api/workshops/[workshop]/cohorts/[cohortId] – one cohort with its commissions (those the caller may see).
// PATCH  /api/workshops/[workshop]/cohorts/[cohortId] – rename, change dates or builders (owner).
// DELETE /api/workshops/[workshop]/cohorts/[cohortId] – remove it; its commissions stay, without a cohort (owner).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { deleteCohort, getCohortDetail, updateCohort } from "@/lib/data/cohorts";
import { readJson } from "@/lib/http/respond";
import { cohortPatchSchema } from "@/lib/schemas/cohort";
import { idParamSchema } from "@/lib/schemas/ids";

const params = z.object({ cohortId: idParamSchema });

export const GET = withWorkshop({ permission: "cohort.read", params }, async (_req, { scope, params }) => {
  return NextResponse.json({ cohort: await getCohortDetail(scope, params.cohortId) });
});

export const PATCH = withWorkshop({ permission: "cohort.manage", params }, async (req, { scope, params }) => {
  const patch = await readJson(req, cohortPatchSchema);
  return NextResponse.json({ cohort: await updateCohort(scope, params.cohortId, patch) });
});

export const DELETE = withWorkshop({ permission: "cohort.manage", params }, async (_req, { scope, params }) => {
  return NextResponse.json(await deleteCohort(scope, params.cohortId));
});
