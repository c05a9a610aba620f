// Who the payment processor's verified events act as in a workshop (read before any scope exists,
// like the membership lookup of a signed-in user).
import { db } from "@/db/knex";
import type { Role } from "@/lib/auth/permissions";

/**
 * Who a verified event acts as in a workshop: the commission's client (the payer) while a member,
 * else an owner. Null when the workshop has no such commission. Only lib/auth/workshop-access.ts
 * turns this into a scope.
 */
export async function findProcessorEventActor(workshopId: number, commissionId: number): Promise<{ membershipId: number; userId: number; role: Role } | null> {
  const c = await db("commissions").where({ id: commissionId, workshop_id: workshopId }).first("client_user_id");
  if (!c) return null;
  const m =
    (await db("memberships").where({ workshop_id: workshopId, user_id: c.client_user_id }).first("id", "user_id", "role")) ??
    (await db("memberships").where({ workshop_id: workshopId, role: "owner" }).orderBy("id").first("id", "user_id", "role"));
  return m ? { membershipId: m.id, userId: m.user_id, role: m.role } : null;
}
