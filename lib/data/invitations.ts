// Invitations to a workshop. Created, listed and revoked within the owner's scope; looked up and
// accepted by token (the token in the e-mailed link is the capability; only its hash is stored).
import { db } from "@/db/knex";
import type { Role } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { AppError, conflict, forbidden, notFound } from "@/lib/http/errors";
import { enqueueEmail } from "@/lib/outbox/enqueue";
import type { InvitationOut } from "@/lib/schemas/member";
import { writeAudit } from "./audit";
import { inTransaction, iso, type Trx } from "./transaction";
import { createUser } from "./users";

export type InvitationState = InvitationOut["state"];

interface InvitationRow {
  id: number;
  workshop_id: number;
  email: string;
  role: Role;
  expires_at: Date;
  accepted_at: Date | null;
  revoked_at: Date | null;
  created_at: Date;
}

export function invitationState(r: Pick<InvitationRow, "expires_at" | "accepted_at" | "revoked_at">, now = new Date()): InvitationState {
  if (r.accepted_at) return "accepted";
  if (r.revoked_at) return "revoked";
  if (new Date(r.expires_at).getTime() <= now.getTime()) return "expired";
  return "pending";
}

const LIST_COLUMNS = ["i.id", "i.workshop_id", "i.email", "i.role", "i.expires_at", "i.accepted_at", "i.revoked_at", "i.created_at", "u.name as invited_by"];

function toOut(r: InvitationRow & { invited_by: string | null }): InvitationOut {
  return {
    id: r.id,
    email: r.email,
    role: r.role,
    state: invitationState(r),
    invitedBy: r.invited_by,
    expiresAt: iso(r.expires_at),
    createdAt: iso(r.created_at),
  };
}

function listQuery(scope: WorkshopScope) {
  return db("invitations as i").leftJoin("users as u", "u.id", "i.invited_by_user_id").where("i.workshop_id", scope.workshopId);
}

/** Invitations of the last 30 days and every one still pending, newest first. */
export async function listInvitations(scope: WorkshopScope): Promise<InvitationOut[]> {
  const since = new Date(Date.now() - 30 * 86_400_000);
  const rows = await listQuery(scope)
    .where((q) => q.where("i.created_at", ">", since).orWhere((q2) => q2.whereNull("i.accepted_at").whereNull("i.revoked_at").where("i.expires_at", ">", new Date())))
    .orderBy("i.id", "desc")
    .select(LIST_COLUMNS);
  return rows.map(toOut);
}

async function getInvitation(scope: WorkshopScope, id: number, trx?: Trx): Promise<InvitationOut> {
  const row = await (trx ? trx("invitations as i").leftJoin("users as u", "u.id", "i.invited_by_user_id").where("i.workshop_id", scope.workshopId) : listQuery(scope))
    .where("i.id", id)
    .first(LIST_COLUMNS);
  if (!row) throw notFound("No such invitation in this workshop.");
  return toOut(row);
}

/**
 * Records an invitation and queues its e-mail in one transaction. An earlier pending invitation to
 * the same address is revoked (its link stops working), so re-inviting is how to re-send.
 */
export async function createInvitation(
  scope: WorkshopScope,
  input: { email: string; role: Role; tokenHash: string; expiresAt: Date; acceptUrl: string },
): Promise<InvitationOut> {
  return inTransaction(async (trx) => {
    const member = await trx("memberships as m")
      .join("users as u", "u.id", "m.user_id")
      .where({ "m.workshop_id": scope.workshopId, "u.email": input.email })
      .first("m.id");
    if (member) {
      throw new AppError("conflict", "This person is already a member.", [{ path: "email", message: "Already a member of this workshop." }]);
    }
    await trx("invitations")
      .where({ workshop_id: scope.workshopId, email: input.email })
      .whereNull("accepted_at")
      .whereNull("revoked_at")
      .update({ revoked_at: new Date() });
    const [id] = await trx("invitations").insert({
      workshop_id: scope.workshopId,
      email: input.email,
      role: input.role,
      token_hash: input.tokenHash,
      invited_by_user_id: scope.userId,
      expires_at: input.expiresAt,
    });
    const workshop = await trx("workshops").where({ id: scope.workshopId }).first("name");
    const inviter = await trx("users").where({ id: scope.userId }).first("name");
    await enqueueEmail(trx, {
      workshopId: scope.workshopId,
      to: input.email,
      template: "invitation",
      props: { workshopName: workshop.name, inviterName: inviter.name, role: input.role, acceptUrl: input.acceptUrl, expiresAt: input.expiresAt.toISOString() },
    });
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "invitation.created", entityType: "invitation", entityId: Number(id), data: { email: input.email, role: input.role } });
    return getInvitation(scope, Number(id), trx);
  });
}

export async function revokeInvitation(scope: WorkshopScope, id: number): Promise<InvitationOut> {
  return inTransaction(async (trx) => {
    const row = await trx("invitations").where({ id, workshop_id: scope.workshopId }).forUpdate().first("accepted_at", "revoked_at", "expires_at");
    if (!row) throw notFound("No such invitation in this workshop.");
    if (row.accepted_at) throw conflict("This invitation has been accepted; remove the member instead.");
    if (!row.revoked_at) {
      await trx("invitations").where({ id, workshop_id: scope.workshopId }).update({ revoked_at: new Date() });
      await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "invitation.revoked", entityType: "invitation", entityId: id });
    }
    return getInvitation(scope, id, trx);
  });
}

export interface InvitationPreview {
  email: string;
  role: Role;
  state: InvitationState;
  expiresAt: string;
  workshop: { slug: string; name: string };
  invitedBy: string | null;
  /** Whether an account exists for the invited address (decides sign-in vs sign-up on the page). */
  accountExists: boolean;
}

/** What the accept page shows for a token; null when no invitation has it. */
export async function findInvitationByToken(tokenHash: string): Promise<InvitationPreview | null> {
  const r = await db("invitations as i")
    .join("workshops as w", "w.id", "i.workshop_id")
    .leftJoin("users as u", "u.id", "i.invited_by_user_id")
    .where("i.token_hash", tokenHash)
    .first("i.email", "i.role", "i.expires_at", "i.accepted_at", "i.revoked_at", "w.slug", "w.name", "u.name as invited_by");
  if (!r) return null;
  const account = await db("users").where({ email: r.email }).first("id");
  return {
    email: r.email,
    role: r.role,
    state: invitationState(r),
    expiresAt: iso(r.expires_at),
    workshop: { slug: r.slug, name: r.name },
    invitedBy: r.invited_by,
    accountExists: !!account,
  };
}

const STATE_MESSAGES: Record<Exclude<InvitationState, "pending">, string> = {
  accepted: "This invitation has already been used.",
  revoked: "This invitation was withdrawn. Ask the workshop's owner for a new one.",
  expired: "This invitation has expired. Ask the workshop's owner for a new one.",
};

/** Locks the invitation row and checks it can still be used. */
async function lockUsable(trx: Trx, tokenHash: string) {
  const inv = await trx("invitations").where({ token_hash: tokenHash }).forUpdate().first("id", "workshop_id", "email", "role", "expires_at", "accepted_at", "revoked_at");
  if (!inv) throw notFound("No such invitation.");
  const state = invitationState(inv);
  if (state !== "pending") throw conflict(STATE_MESSAGES[state]);
  return inv as InvitationRow;
}

async function join(trx: Trx, inv: InvitationRow, userId: number): Promise<string> {
  const existing = await trx("memberships").where({ workshop_id: inv.workshop_id, user_id: userId }).first("id");
  // Someone who is already a member keeps the role they have; the invitation is used up either way.
  if (!existing) await trx("memberships").insert({ workshop_id: inv.workshop_id, user_id: userId, role: inv.role });
  await trx("invitations").where({ id: inv.id }).update({ accepted_at: new Date(), accepted_by_user_id: userId });
  await writeAudit(trx, { workshopId: inv.workshop_id, actorUserId: userId, action: "invitation.accepted", entityType: "invitation", entityId: inv.id, data: { role: inv.role } });
  const w = await trx("workshops").where({ id: inv.workshop_id }).first("slug");
  return w.slug as string;
}

/** The signed-in user accepts an invitation sent to their address; returns the workshop's slug. */
export async function acceptInvitation(tokenHash: string, user: { id: number; email: string }): Promise<{ slug: string }> {
  return inTransaction(async (trx) => {
    const inv = await lockUsable(trx, tokenHash);
    if (inv.email.toLowerCase() !== user.email.toLowerCase()) {
      throw forbidden(`This invitation was sent to another address. Sign in as ${inv.email} to accept it.`);
    }
    return { slug: await join(trx, inv, user.id) };
  });
}

/**
 * Someone without an account accepts: the account (verified: the link proves the address), the
 * membership and the used invitation are one transaction.
 */
export async function acceptInvitationAsNewUser(tokenHash: string, input: { name: string; passwordHash: string | null }): Promise<{ slug: string; email: string; userId: number }> {
  return inTransaction(async (trx) => {
    const inv = await lockUsable(trx, tokenHash);
    const existing = await trx("users").where({ email: inv.email }).first("id");
    if (existing) throw conflict("An account exists for this address. Sign in to accept the invitation.");
    const userId = await createUser({ email: inv.email, name: input.name, passwordHash: input.passwordHash, emailVerified: true }, trx);
    return { slug: await join(trx, inv, userId), email: inv.email, userId };
  });
}
