// GET /api/bench/commission-list?workshopId=…&(list query) – benchmark only: the commission list's SQL
// with no sign-in, membership check or shaping (the floor of npm run bench:commissions). Answers 404
// unless the server was started with BENCH_FLOOR_TOKEN and the request carries it in x-bench-token;
// never set that variable outside the bench's own server.
import { timingSafeEqual } from "node:crypto";
import { NextResponse, type NextRequest } from "next/server";
import { benchCommissionListFloor } from "@/lib/data/commission-list-floor";
import { errorResponse, readQuery } from "@/lib/http/respond";
import { notFound } from "@/lib/http/errors";
import { commissionListQuerySchema } from "@/lib/schemas/commission";
import { idParamSchema } from "@/lib/schemas/ids";

const floorQuerySchema = commissionListQuerySchema.extend({ workshopId: idParamSchema });

function allowed(req: NextRequest): boolean {
  const token = process.env.BENCH_FLOOR_TOKEN;
  const given = req.headers.get("x-bench-token");
  if (!token || token.length < 16 || !given || given.length !== token.length) return false;
  return timingSafeEqual(Buffer.from(given), Buffer.from(token));
}

export async function GET(req: NextRequest) {
  try {
    if (!allowed(req)) throw notFound();
    const { workshopId, ...query } = readQuery(req, floorQuerySchema);
    return NextResponse.json(await benchCommissionListFloor(workshopId, query));
  } catch (err) {
    return errorResponse(err);
  }
}
