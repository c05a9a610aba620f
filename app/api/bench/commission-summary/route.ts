// GET /api/bench/commission-summary?workshopId=…&id=… – benchmark only: the data a commission's page
// reads on the server (its summary for the header and tabs), as the workshop's owner, with no
// session, membership check or rendering: the floor of the commission page bench. A 404 unless
// the bench's own server has BENCH_FLOOR_TOKEN and the request carries it (lib/http/bench-floor.ts).
import { NextResponse } from "next/server";
import { z } from "zod";
import { getCommissionSummary } from "@/lib/data/commissions";
import { benchFloorRoute, benchOwnerScope } from "@/lib/http/bench-floor";
import { readQuery } from "@/lib/http/respond";
import { idParamSchema } from "@/lib/schemas/ids";

const floorQuerySchema = z.object({ workshopId: idParamSchema, id: idParamSchema });

export const GET = benchFloorRoute(async (req) => {
  const { workshopId, id } = readQuery(req, floorQuerySchema);
  return NextResponse.json({ commission: await getCommissionSummary(await benchOwnerScope(workshopId), id) });
});
