// GET /api/bench/commission-list?workshopId=…&(list query) – benchmark only: the commission list's SQL
// with no sign-in, membership check or shaping (the floor of the commission list bench). A 404
// unless the bench's own server has BENCH_FLOOR_TOKEN and the request carries it (lib/http/bench-floor.ts).
import { NextResponse } from "next/server";
import { benchCommissionListFloor } from "@/lib/data/commission-list-floor";
import { benchFloorRoute } from "@/lib/http/bench-floor";
import { readQuery } from "@/lib/http/respond";
import { commissionListQuerySchema } from "@/lib/schemas/commission";
import { idParamSchema } from "@/lib/schemas/ids";

const floorQuerySchema = commissionListQuerySchema.extend({ workshopId: idParamSchema });

export const GET = benchFloorRoute(async (req) => {
  const { workshopId, ...query } = readQuery(req, floorQuerySchema);
  return NextResponse.json(await benchCommissionListFloor(workshopId, query));
});
