// GET /api/workshops/[workshop]/commissions/[id]/spec-versions/[versionId] – one version, results and the diff against the last approved one.
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getSpecVersion } from "@/lib/data/spec-versions";
import { idParamSchema } from "@/lib/schemas/ids";

const params = z.object({ id: idParamSchema, versionId: idParamSchema });

export const GET = withWorkshop({ permission: "spec.read", params }, async (_req, { scope, params }) => {
  return NextResponse.json({ version: await getSpecVersion(scope, params.id, params.versionId) });
});
