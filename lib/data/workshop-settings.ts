// A workshop's working settings: name, units, currency, deposit percentage, build-stage template,
// sign-off rule, e-mail sender name, logo. Read by every commission function; changed by the owner.
import type { Knex } from "knex";
import { db } from "@/db/knex";
import { can } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { AppError, forbidden } from "@/lib/http/errors";
import type { WorkshopSettingsOut, WorkshopSettingsPatch } from "@/lib/schemas/workshop-settings";
import { removedStageKeys } from "@/lib/workflow/stage-template";
import { DEFAULT_BUILD_STAGES, stageLabel, type BuildStage } from "@/lib/workflow/stages";
import { writeAudit } from "./audit";
import { workshopLogoPath } from "./workshop-logo";
import { inTransaction, type Trx } from "./transaction";

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
  /** The logo's file key from the photo pipeline (null until one is uploaded). */
  logoFileKey: string | null;
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
    logoFileKey: row.logo_file_key ?? null,
  };
}

/** The settings as the routes and the settings page show them. */
export function toSettingsOut(s: WorkshopSettings): WorkshopSettingsOut {
  return {
    slug: s.slug,
    name: s.name,
    unitPreference: s.unitPreference,
    currency: s.currency,
    depositPercent: s.depositPercent,
    buildStages: s.buildStages.map(({ key, label }) => ({ key, label })),
    requireStageSignoff: s.requireStageSignoff,
    emailSenderName: s.emailSenderName,
    // The store's key never leaves the app: the page and the route get our own logo address.
    logoUrl: workshopLogoPath(s.slug, s.logoFileKey),
  };
}

const COLUMNS = {
  name: "name",
  unitPreference: "unit_preference",
  currency: "currency",
  depositPercent: "deposit_percent",
  buildStages: "build_stages",
  requireStageSignoff: "require_stage_signoff",
  emailSenderName: "email_sender_name",
} as const satisfies Record<keyof WorkshopSettingsPatch, string>;

/**
 * 409 when the new template drops a stage that a commission is in, is on hold from, or that its
 * client was last told of: those commissions would have nowhere to go. Names the stage and them.
 */
async function guardRemovedStages(trx: Trx, scope: WorkshopScope, before: readonly BuildStage[], after: readonly BuildStage[]): Promise<void> {
  const removed = removedStageKeys(before, after);
  if (removed.length === 0) return;
  // Locking the rows (and the index range) keeps a commission from moving into the stage meanwhile.
  const rows = (await trx("commissions")
    .where("workshop_id", scope.workshopId)
    .where((q) => q.whereIn("stage", removed).orWhereIn("held_from", removed).orWhereIn("client_stage", removed))
    .orderBy("number")
    .forUpdate()
    .select("number", "stage", "held_from", "client_stage")) as Array<{ number: string; stage: string; held_from: string | null; client_stage: string }>;
  if (rows.length === 0) return;
  const issues = removed.flatMap((key) => {
    const here = rows.filter((r) => r.stage === key || r.held_from === key || r.client_stage === key).map((r) => r.number);
    if (here.length === 0) return [];
    const label = stageLabel(key, before);
    const list = here.length > 5 ? `${here.slice(0, 5).join(", ")} and ${here.length - 5} more` : here.join(", ");
    return [{ path: "buildStages", message: `"${label}" still has ${here.length} commission${here.length === 1 ? "" : "s"} in it (${list}). Move ${here.length === 1 ? "it" : "them"} to another stage first.` }];
  });
  throw new AppError("conflict", `A stage with commissions in it cannot be removed. ${issues.map((i) => i.message).join(" ")}`, issues);
}

/**
 * Changes the workshop's settings (owner only). Only fields that really change are stored and
 * written to the audit log with their old and new values. Currency, deposit percentage and units
 * apply to commissions opened from now on; each commission keeps its own.
 */
export async function updateWorkshopSettings(scope: WorkshopScope, patch: WorkshopSettingsPatch): Promise<WorkshopSettings> {
  if (!can(scope.role, "settings.manage")) throw forbidden("Only the owner changes the workshop's settings.");
  return inTransaction(async (trx) => {
    await trx("workshops").where({ id: scope.workshopId }).forUpdate().first("id");
    const before = await getWorkshopSettings(scope, trx);
    const changes: Record<string, { from: unknown; to: unknown }> = {};
    const update: Record<string, unknown> = {};
    for (const field of Object.keys(COLUMNS) as Array<keyof typeof COLUMNS>) {
      const next = patch[field];
      if (next === undefined || JSON.stringify(next) === JSON.stringify(before[field])) continue;
      changes[field] = { from: before[field], to: next };
      update[COLUMNS[field]] = field === "buildStages" ? JSON.stringify(next) : next;
    }
    if (Object.keys(update).length === 0) return before;
    if (patch.buildStages && changes.buildStages) await guardRemovedStages(trx, scope, before.buildStages, patch.buildStages);
    await trx("workshops").where({ id: scope.workshopId }).update(update);
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "workshop.settings_changed", entityType: "workshop", entityId: scope.workshopId, data: changes });
    return getWorkshopSettings(scope, trx);
  });
}
