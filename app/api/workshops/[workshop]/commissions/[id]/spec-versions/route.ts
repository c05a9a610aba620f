// GET  /api/workshops/[workshop]/commissions/[id]/spec-versions – versions (a client: those sent to them).
// POST /api/workshops/[workshop]/commissions/[id]/spec-versions – save a new version with its computed results.
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { createSpecVersion, listSpecVersions } from "@/lib/data/spec-versions";
import { readJson } from "@/lib/http/respond";
import { idParamSchema } from "@/lib/schemas/ids";
import { specVersionInputSchema } from "@/lib/schemas/spec-version";

const params = z.object({ id: idParamSchema });

export const GET = withWorkshop({ permission: "spec.read", params }, async (_req, { scope, params }) => {
  return NextResponse.json({ versions: await listSpecVersions(scope, params.id) });
});

export const POST = withWorkshop({ permission: "spec.draft", params }, async (req, { scope, params }) => {
  const input = await readJson(req, specVersionInputSchema);
  return NextResponse.json({ version: await createSpecVersion(scope, params.id, input) }, { status: 201 });
});
