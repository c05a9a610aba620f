// The e-mail outbox table. Messages are inserted inside the caller's transaction (lib/outbox/enqueue.ts)
// and claimed by workers with SELECT … FOR UPDATE SKIP LOCKED, so any number of workers can run.
import { db } from "@/db/knex";
import type { WorkshopScope } from "@/lib/auth/scope";
import { conflict, notFound } from "@/lib/http/errors";
import { inTransaction, iso, type Trx } from "./transaction";

export type OutboxStatus = "pending" | "sending" | "sent" | "failed";

export interface OutboxInsert {
  workshopId: number | null;
  template: string;
  to: string;
  subject: string;
  props: unknown;
  idempotencyKey: string;
}

export async function insertOutboxMessage(trx: Trx, m: OutboxInsert): Promise<number> {
  const [id] = await trx("email_outbox").insert({
    workshop_id: m.workshopId,
    template: m.template,
    to_address: m.to,
    subject: m.subject,
    props: JSON.stringify(m.props),
    idempotency_key: m.idempotencyKey,
  });
  return Number(id);
}

export interface ClaimedMessage extends OutboxInsert {
  id: number;
  attempts: number;
}

/**
 * Claims up to `limit` due messages for this worker: pending ones whose time has come, and
 * "sending" ones whose worker died (lock expired). Rows another worker holds are skipped.
 */
export async function claimDueMessages(limit: number, lockMs: number): Promise<ClaimedMessage[]> {
  return inTransaction(async (trx) => {
    const now = new Date();
    const rows = await trx("email_outbox")
      .where((q) => q.where("status", "pending").andWhere("next_attempt_at", "<=", now))
      .orWhere((q) => q.where("status", "sending").andWhere("locked_until", "<", now))
      .orderBy("next_attempt_at")
      .limit(limit)
      .forUpdate()
      .skipLocked()
      .select("id", "workshop_id", "template", "to_address", "subject", "props", "idempotency_key", "attempts");
    if (rows.length === 0) return [];
    const ids = rows.map((r: { id: number }) => r.id);
    await trx("email_outbox")
      .whereIn("id", ids)
      .update({ status: "sending", locked_until: new Date(now.getTime() + lockMs), attempts: trx.raw("attempts + 1") });
    return rows.map(
      (r: { id: number; workshop_id: number | null; template: string; to_address: string; subject: string; props: unknown; idempotency_key: string; attempts: number }) => ({
        id: Number(r.id),
        workshopId: r.workshop_id,
        template: r.template,
        to: r.to_address,
        subject: r.subject,
        props: typeof r.props === "string" ? JSON.parse(r.props) : r.props,
        idempotencyKey: r.idempotency_key,
        attempts: r.attempts + 1,
      }),
    );
  });
}

export async function markSent(id: number, providerMessageId: string): Promise<void> {
  await db("email_outbox")
    .where({ id })
    .update({ status: "sent", sent_at: new Date(), provider_message_id: providerMessageId, locked_until: null, last_error: null });
}

export async function markRetry(id: number, error: string, nextAttemptAt: Date): Promise<void> {
  await db("email_outbox")
    .where({ id })
    .update({ status: "pending", next_attempt_at: nextAttemptAt, locked_until: null, last_error: error.slice(0, 500) });
}

export async function markFailed(id: number, error: string): Promise<void> {
  await db("email_outbox").where({ id }).update({ status: "failed", locked_until: null, last_error: error.slice(0, 500) });
}

export interface OutboxMessageOut {
  id: number;
  template: string;
  to: string;
  subject: string;
  status: OutboxStatus;
  attempts: number;
  lastError: string | null;
  createdAt: string;
  updatedAt: string;
}

function toOut(r: {
  id: number;
  template: string;
  to_address: string;
  subject: string;
  status: OutboxStatus;
  attempts: number;
  last_error: string | null;
  created_at: Date;
  updated_at: Date;
}): OutboxMessageOut {
  return {
    id: Number(r.id),
    template: r.template,
    to: r.to_address,
    subject: r.subject,
    status: r.status,
    attempts: r.attempts,
    lastError: r.last_error,
    createdAt: iso(r.created_at),
    updatedAt: iso(r.updated_at),
  };
}

const OUT_COLUMNS = ["id", "template", "to_address", "subject", "status", "attempts", "last_error", "created_at", "updated_at"];

/** The workshop's e-mail in one status (the owner's view of undelivered mail uses "failed"). */
export async function listOutboxMessages(scope: WorkshopScope, status: OutboxStatus, limit = 100): Promise<OutboxMessageOut[]> {
  const rows = await db("email_outbox").where({ workshop_id: scope.workshopId, status }).orderBy("id", "desc").limit(limit).select(OUT_COLUMNS);
  return rows.map(toOut);
}

/** Puts a failed message of this workshop back in the queue, due now, with a fresh attempt count. */
export async function retryFailedMessage(scope: WorkshopScope, id: number): Promise<OutboxMessageOut> {
  const row = await db("email_outbox").where({ id, workshop_id: scope.workshopId }).first("status");
  if (!row) throw notFound("No such e-mail in this workshop.");
  if (row.status !== "failed") throw conflict("Only an e-mail that failed can be sent again.");
  await db("email_outbox")
    .where({ id, workshop_id: scope.workshopId, status: "failed" })
    .update({ status: "pending", attempts: 0, next_attempt_at: new Date(), last_error: null });
  const out = await db("email_outbox").where({ id, workshop_id: scope.workshopId }).first(OUT_COLUMNS);
  return toOut(out);
}

/** Status of some messages by id (tests and the worker's log). */
export async function outboxStatusByIds(ids: number[]): Promise<OutboxMessageOut[]> {
  if (ids.length === 0) return [];
  const rows = await db("email_outbox").whereIn("id", ids).orderBy("id").select(OUT_COLUMNS);
  return rows.map(toOut);
}
