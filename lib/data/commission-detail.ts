// One commission with everything its page needs: the summary, payments so far, the stage line,
// the moves open to the caller and where its spec stands.
import type { WorkshopScope } from "@/lib/auth/scope";
import type { CommissionDetail } from "@/lib/schemas/commission-out";
import { stageLine, stageLabel } from "@/lib/workflow/stages";
import { getVisibleCommissionRow } from "./commission-access";
import { getCommissionSummary } from "./commissions";
import { paidFlags, paymentTotals } from "./payment-totals";
import { transitionOptions } from "./stage-transitions";
import { inTransaction } from "./transaction";
import { getWorkshopSettings } from "./workshop-settings";

export async function getCommissionDetail(scope: WorkshopScope, id: number): Promise<CommissionDetail> {
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, id, { trx });
    const summary = await getCommissionSummary(scope, id, trx);
    const settings = await getWorkshopSettings(scope, trx);
    const totals = await paymentTotals(trx, scope.workshopId, id);
    const versions = trx("spec_versions").where({ workshop_id: scope.workshopId, commission_id: id }).orderBy("version", "desc");
    if (scope.role === "client") versions.whereNotNull("submitted_at");
    const list = (await versions.select("id", "version", "approved_at", "submitted_at", "has_errors")) as Array<{
      id: number;
      version: number;
      approved_at: Date | null;
      submitted_at: Date | null;
      has_errors: number;
    }>;
    const latest = list[0];
    const approved = list.find((v) => v.approved_at);
    return {
      ...summary,
      requestNotes: row.request_notes ?? "",
      payments: scope.role === "builder" ? null : { ...totals, ...paidFlags(totals, row) },
      stages: stageLine(settings.buildStages).map((key) => ({ key, label: stageLabel(key, settings.buildStages) })),
      transitions: scope.role === "client" && row.stage !== "spec" ? [] : await transitionOptions(trx, scope, row, settings),
      latestSpecVersion: latest ? { id: latest.id, version: latest.version, approved: !!latest.approved_at, submitted: !!latest.submitted_at, hasErrors: !!latest.has_errors } : null,
      approvedSpecVersion: approved ? { id: approved.id, version: approved.version } : null,
    };
  });
}
