// Comments between the client and the workshop on one commission.
import type { WorkshopScope } from "@/lib/auth/scope";
import type { CommentOut } from "@/lib/schemas/commission-out";
import { writeAudit } from "./audit";
import { getVisibleCommissionRow } from "./commission-access";
import { inTransaction, iso } from "./transaction";

export async function listComments(scope: WorkshopScope, commissionId: number): Promise<CommentOut[]> {
  return inTransaction(async (trx) => {
    await getVisibleCommissionRow(scope, commissionId, { trx });
    const rows = await trx("commission_comments as k")
      .join("users as u", "u.id", "k.author_user_id")
      .leftJoin("memberships as m", (j) => j.on("m.user_id", "k.author_user_id").andOn("m.workshop_id", "k.workshop_id"))
      .where({ "k.workshop_id": scope.workshopId, "k.commission_id": commissionId })
      .orderBy("k.created_at", "asc")
      .orderBy("k.id", "asc")
      .select("k.id", "k.body", "k.created_at", "u.id as author_id", "u.name as author_name", "m.role");
    return rows.map((r: { id: number; body: string; created_at: Date; author_id: number; author_name: string; role: string | null }) => ({
      id: Number(r.id),
      author: { id: r.author_id, name: r.author_name, role: r.role },
      body: r.body,
      createdAt: iso(r.created_at),
    }));
  });
}

export async function addComment(scope: WorkshopScope, commissionId: number, body: string): Promise<{ id: number }> {
  return inTransaction(async (trx) => {
    await getVisibleCommissionRow(scope, commissionId, { trx });
    const [id] = await trx("commission_comments").insert({ workshop_id: scope.workshopId, commission_id: commissionId, author_user_id: scope.userId, body });
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "comment.added", entityType: "commission", entityId: commissionId });
    return { id: Number(id) };
  });
}
