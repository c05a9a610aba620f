// A workshop's working settings: its build-stage template, sign-off rule, deposit percentage.
import type { Knex } from "knex";
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

/** A workshop's build-stage template from its stored column (JSON, as text or parsed); the default when never edited. */
export function buildStagesFrom(raw: unknown): BuildStage[] {
  const value = typeof raw === "string" ? (JSON.parse(raw) as unknown) : raw;
  return Array.isArray(value) ? (value as BuildStage[]) : DEFAULT_BUILD_STAGES;
}

/** The stored template of one workshop as a scalar subquery, for a query that reads it alongside (`build_stages`). */
export function buildStagesColumn(knex: Knex | Trx, workshopId: number): Knex.Raw {
  return knex.raw("(SELECT w.build_stages FROM workshops AS w WHERE w.id = ?) AS build_stages", [workshopId]);
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
    buildStages: buildStagesFrom(row.build_stages),
    requireStageSignoff: !!row.require_stage_signoff,
    emailSenderName: row.email_sender_name,
    setupRanges: row.setup_ranges,
  };
}
