// GET /api/bench/overview?workshopId=… – benchmark only: the data the owner's overview page reads
// (getOverview and the builders to reassign to), as the workshop's owner, with no session,
// membership check or rendering: the floor of the overview page bench. A 404 unless the bench's
// own server has BENCH_FLOOR_TOKEN and the request carries it (lib/http/bench-floor.ts).
import { NextResponse } from "next/server";
import { z } from "zod";
import { listCommissionPeople } from "@/lib/data/commissions";
import { getOverview } from "@/lib/data/overview";
import { benchFloorRoute, benchOwnerScope } from "@/lib/http/bench-floor";
import { readQuery } from "@/lib/http/respond";
import { idParamSchema } from "@/lib/schemas/ids";
import { overviewQuerySchema } from "@/lib/schemas/overview";

const floorQuerySchema = z.object({ workshopId: idParamSchema });

export const GET = benchFloorRoute(async (req) => {
  const { workshopId } = readQuery(req, floorQuerySchema);
  const scope = await benchOwnerScope(workshopId);
  const [overview, people] = await Promise.all([getOverview(scope, overviewQuerySchema.parse({})), listCommissionPeople(scope)]);
  return NextResponse.json({ openTotal: overview.openTotal, inStage: overview.inStage.length, builders: people.builders.length });
});
