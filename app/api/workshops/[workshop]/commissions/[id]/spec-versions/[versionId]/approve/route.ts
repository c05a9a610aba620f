// POST /api/workshops/[workshop]/commissions/[id]/spec-versions/[versionId]/approve – the client approves (locks) the version.
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { approveSpecVersion } from "@/lib/data/spec-versions";
import { idParamSchema } from "@/lib/schemas/ids";

const params = z.object({ id: idParamSchema, versionId: idParamSchema });

export const POST = withWorkshop({ permission: "spec.approve", params }, async (_req, { scope, params }) => {
  return NextResponse.json(await approveSpecVersion(scope, params.id, params.versionId));
});
