// Memberships: who belongs to which workshop with which role. The first two functions work from the
// signed-in user's id (they are how a scope is found); every other one takes the workshop scope.
import { db } from "@/db/knex";
import type { Role } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { conflict, notFound } from "@/lib/http/errors";
import type { MemberOut } from "@/lib/schemas/member";
import { writeAudit } from "./audit";
import { inTransaction, iso, type Trx } from "./transaction";

export interface WorkshopRecord {
  id: number;
  slug: string;
  name: string;
  unitPreference: "mm" | "in";
  currency: string;
}

export interface MembershipRecord {
  membershipId: number;
  role: Role;
  workshop: WorkshopRecord;
}

/** The user's membership in the workshop with this slug; null when either does not exist. */
export async function findMembershipBySlug(userId: number, slug: string): Promise<MembershipRecord | null> {
  const row = await db("memberships as m")
    .join("workshops as w", "w.id", "m.workshop_id")
    .where({ "m.user_id": userId, "w.slug": slug })
    .first("m.id as membership_id", "m.role", "w.id", "w.slug", "w.name", "w.unit_preference", "w.currency");
  if (!row) return null;
  return {
    membershipId: row.membership_id,
    role: row.role,
    workshop: { id: row.id, slug: row.slug, name: row.name, unitPreference: row.unit_preference, currency: row.currency },
  };
}

/** Every workshop the user belongs to, by name. */
export async function listMembershipsForUser(userId: number): Promise<Array<{ workshop: { slug: string; name: string }; role: Role }>> {
  const rows = await db("memberships as m")
    .join("workshops as w", "w.id", "m.workshop_id")
    .where("m.user_id", userId)
    .orderBy("w.name")
    .select("w.slug", "w.name", "m.role");
  return rows.map((r: { slug: string; name: string; role: Role }) => ({ workshop: { slug: r.slug, name: r.name }, role: r.role }));
}

/** The full member list (ids, names, addresses, roles). */
export async function listMembers(scope: WorkshopScope): Promise<MemberOut[]> {
  const rows = await db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .where("m.workshop_id", scope.workshopId)
    .orderByRaw("FIELD(m.role, 'owner', 'bookkeeper', 'builder', 'client'), u.name")
    .select("m.id", "m.user_id", "u.name", "u.email", "m.role", "m.created_at");
  return rows.map((r: { id: number; user_id: number; name: string; email: string; role: Role; created_at: Date }) => ({
    id: r.id,
    userId: r.user_id,
    name: r.name,
    email: r.email,
    role: r.role,
    joinedAt: iso(r.created_at),
  }));
}

/** Names only, for roles that may know who works here but not their addresses. */
export async function listMemberNames(scope: WorkshopScope): Promise<Array<{ name: string }>> {
  const rows = await db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .where("m.workshop_id", scope.workshopId)
    .orderBy("u.name")
    .select("u.name");
  return rows.map((r: { name: string }) => ({ name: r.name }));
}

export async function countMembersByRole(scope: WorkshopScope): Promise<Record<Role, number>> {
  const rows = await db("memberships").where("workshop_id", scope.workshopId).select("role").count({ n: "*" }).groupBy("role");
  const out: Record<Role, number> = { owner: 0, builder: 0, bookkeeper: 0, client: 0 };
  for (const r of rows as Array<{ role: Role; n: number }>) out[r.role] = Number(r.n);
  return out;
}

const LAST_OWNER = "A workshop always keeps at least one owner. Make someone else an owner first.";

/**
 * Locks the workshop's owner rows and the target membership (in this workshop only) so two owners
 * demoting each other at the same moment cannot leave the workshop without one.
 */
async function lockForOwnerChange(trx: Trx, scope: WorkshopScope, memberId: number) {
  const owners = await trx("memberships").where({ workshop_id: scope.workshopId, role: "owner" }).forUpdate().select("id");
  const target = await trx("memberships").where({ id: memberId, workshop_id: scope.workshopId }).forUpdate().first("id", "user_id", "role");
  if (!target) throw notFound("No such member in this workshop.");
  return { ownerCount: owners.length, target: target as { id: number; user_id: number; role: Role } };
}

export async function changeMemberRole(scope: WorkshopScope, memberId: number, role: Role): Promise<MemberOut> {
  await inTransaction(async (trx) => {
    const { ownerCount, target } = await lockForOwnerChange(trx, scope, memberId);
    if (target.role === role) return;
    if (target.role === "owner" && ownerCount <= 1) throw conflict(LAST_OWNER);
    await trx("memberships").where({ id: memberId, workshop_id: scope.workshopId }).update({ role });
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: scope.userId,
      action: "member.role_changed",
      entityType: "membership",
      entityId: memberId,
      data: { from: target.role, to: role },
    });
  });
  const member = (await listMembers(scope)).find((m) => m.id === memberId);
  if (!member) throw notFound("No such member in this workshop.");
  return member;
}

export async function removeMember(scope: WorkshopScope, memberId: number): Promise<void> {
  await inTransaction(async (trx) => {
    const { ownerCount, target } = await lockForOwnerChange(trx, scope, memberId);
    if (target.role === "owner" && ownerCount <= 1) throw conflict(LAST_OWNER);
    await trx("memberships").where({ id: memberId, workshop_id: scope.workshopId }).delete();
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: scope.userId,
      action: "member.removed",
      entityType: "membership",
      entityId: memberId,
      data: { userId: target.user_id, role: target.role },
    });
  });
}
