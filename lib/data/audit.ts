import type { Trx } from "./transaction";

/** One line of the audit log, written in the same transaction as the change it records. */
export async function writeAudit(
  trx: Trx,
  entry: { workshopId: number | null; actorUserId: number | null; action: string; entityType: string; entityId?: string | number; data?: unknown },
): Promise<void> {
  await trx("audit_log").insert({
    workshop_id: entry.workshopId,
    actor_user_id: entry.actorUserId,
    action: entry.action,
    entity_type: entry.entityType,
    entity_id: entry.entityId === undefined ? null : String(entry.entityId),
    data: entry.data === undefined ? null : JSON.stringify(entry.data),
  });
}
