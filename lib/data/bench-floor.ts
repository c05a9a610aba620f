// Benchmark only: whom a floor route acts as (the workshop's first owner), read once per workshop
// by resolveBenchFloorScope in lib/auth/workshop-access.ts, which answers only while the bench's
// BENCH_FLOOR_TOKEN is set.
import { db } from "@/db/knex";
import type { Role } from "@/lib/auth/permissions";

export async function findBenchFloorOwner(workshopId: number): Promise<{ membershipId: number; userId: number; role: Role } | null> {
  const m = await db("memberships").where({ workshop_id: workshopId, role: "owner" }).orderBy("id").first("id", "user_id", "role");
  return m ? { membershipId: m.id, userId: m.user_id, role: m.role } : null;
}
