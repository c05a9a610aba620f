// POST /api/workshops/[workshop]/commissions/[id]/spec-versions/[versionId]/submit – send the latest version to the client for approval.
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { submitSpecVersion } from "@/lib/data/spec-versions";
import { readJson } from "@/lib/http/respond";
import { idParamSchema } from "@/lib/schemas/ids";
import { specSubmitSchema } from "@/lib/schemas/spec-version";

const params = z.object({ id: idParamSchema, versionId: idParamSchema });

export const POST = withWorkshop({ permission: "spec.draft", params }, async (req, { scope, params }) => {
  const { note } = await readJson(req, specSubmitSchema);
  return NextResponse.json(await submitSpecVersion(scope, params.id, params.versionId, note ?? null));
});
