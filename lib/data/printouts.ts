// What the shop printouts need, read with the caller's visibility: the approved spec version for
// the fret template; for the build sheet also the people, the stages with dates and the setup sheet
// (a client: only a signed one).
import type { WorkshopScope } from "@/lib/auth/scope";
import { conflict } from "@/lib/http/errors";
import type { BuildSheetData } from "@/lib/printing/build-sheet-pdf";
import { checkSetupSheet } from "@/lib/setup/checks";
import { setupFigures, specStrings } from "@/lib/setup/figures";
import { getCommissionSummary } from "./commissions";
import { getVisibleCommissionRow } from "./commission-access";
import { getWorkshopSetupRanges } from "./setup-ranges";
import { approvedSpecVersion, currentSheetRow, latestSignedSheetRow, toRevision, type ApprovedSpec } from "./setup-sheet-rows";
import { listStageHistory } from "./stage-transitions";
import { inTransaction } from "./transaction";
import { getWorkshopSettings } from "./workshop-settings";
import { getWorkshopLogoForPrint } from "./workshop-logo";

export interface TemplatePrintData {
  workshopName: string;
  unit: "mm" | "in";
  commission: { number: string; title: string };
  spec: ApprovedSpec;
}

/** The approved spec of a commission the caller may see (409 when none is approved yet). */
export async function getTemplatePrintData(scope: WorkshopScope, commissionId: number): Promise<TemplatePrintData> {
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, commissionId, { trx });
    const settings = await getWorkshopSettings(scope, trx);
    const spec = await approvedSpecVersion(trx, scope, commissionId);
    if (!spec) throw conflict("The fret template is printed from the approved spec, and this commission has none yet.");
    return { workshopName: settings.name, unit: settings.unitPreference, commission: { number: row.number, title: row.title }, spec };
  });
}

export async function getBuildSheetData(scope: WorkshopScope, commissionId: number): Promise<BuildSheetData> {
  const base = await inTransaction(async (trx) => {
    const summary = await getCommissionSummary(scope, commissionId, trx);
    const settings = await getWorkshopSettings(scope, trx);
    const spec = await approvedSpecVersion(trx, scope, commissionId);
    const sheetRow = scope.role === "client" ? await latestSignedSheetRow(trx, scope, commissionId) : await currentSheetRow(trx, scope, commissionId);
    const { ranges } = await getWorkshopSetupRanges(scope, trx);
    let setup: BuildSheetData["setup"] = null;
    if (sheetRow) {
      const revision = toRevision(sheetRow);
      const strings = spec ? specStrings(spec.result) : [];
      const family = spec?.result.family ?? "guitar";
      setup = {
        revision,
        figures: setupFigures(revision.values, strings),
        issues: checkSetupSheet(revision.values, ranges[family], { stringCount: strings.length, strings, unit: settings.unitPreference }),
      };
    }
    return {
      workshopName: settings.name,
      unit: settings.unitPreference,
      generatedAt: new Date().toISOString(),
      commission: {
        number: summary.number,
        title: summary.title,
        clientName: summary.client.name,
        builderName: summary.builder?.name ?? null,
        stageLabel: summary.stageLabel,
        targetDate: summary.targetDate,
      },
      spec: spec && { version: spec.version, approvedAt: spec.approvedAt, spec: spec.spec, result: spec.result },
      setup,
    };
  });
  const history = await listStageHistory(scope, commissionId);
  return {
    ...base,
    logo: await getWorkshopLogoForPrint(scope),
    stages: history.map((h) => ({ at: h.createdAt, fromLabel: h.fromLabel, toLabel: h.toLabel, actor: h.actor?.name ?? null, note: h.note })),
  };
}
