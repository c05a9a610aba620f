// Benchmark only: the commission list's own SQL for one workshop with nothing around it — no
// session, membership, settings or shaping — the floor `npm run bench:commissions` measures the
// real route against. Only app/api/bench/commission-list calls it, and that answers 404 unless
// the bench started the server with BENCH_FLOOR_TOKEN.
import { db } from "@/db/knex";
import type { CommissionListQuery } from "@/lib/schemas/commission";
import { DEFAULT_BUILD_STAGES } from "@/lib/workflow/stages";
import { commissionListQueries, stageSortLine } from "./commissions";

const LINE = stageSortLine(DEFAULT_BUILD_STAGES);

/** The owner's list query of `workshopId` (what visibleCommissions gives an owner), as raw rows. */
export async function benchCommissionListFloor(workshopId: number, query: CommissionListQuery): Promise<{ total: number; rows: unknown[] }> {
  const { count, rows } = commissionListQueries(db, db("commissions as c").where("c.workshop_id", workshopId), query, { workshopId, stageColumn: "c.stage", line: LINE });
  const [counted, list] = await Promise.all([count, rows]);
  return { total: Number(counted?.n ?? 0), rows: list };
}
