// A workshop's working settings: its build-stage template, sign-off rule, deposit percentage.
import { db } from "@/db/knex";
import type { WorkshopScope } from "@/lib/auth/scope";
import { DEFAULT_BUILD_STAGES, type BuildStage } from "@/lib/workflow/stages";
import type { Trx } from "./transaction";

export interface WorkshopSettings {
  workshopId: number;
  slug: string;
  name: string;
  unitPreference: "mm" | "in";
  currency: string;
  depositPercent: number;
  buildStages: BuildStage[];
  requireStageSignoff: boolean;
  emailSenderName: string | null;
  setupRanges: unknown;
}

export async function getWorkshopSettings(scope: WorkshopScope, trx?: Trx): Promise<WorkshopSettings> {
  const row = await (trx ?? db)("workshops").where({ id: scope.workshopId }).first();
  return {
    workshopId: row.id,
    slug: row.slug,
    name: row.name,
    unitPreference: row.unit_preference,
    currency: row.currency,
    depositPercent: Number(row.deposit_percent),
    // A workshop that never edited its template works to the default one.
    buildStages: (row.build_stages as BuildStage[] | null) ?? DEFAULT_BUILD_STAGES,
    requireStageSignoff: !!row.require_stage_signoff,
    emailSenderName: row.email_sender_name,
    setupRanges: row.setup_ranges,
  };
}
