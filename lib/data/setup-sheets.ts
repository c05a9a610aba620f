// The final setup sheet of a commission: saved as drafts during final setup, checked against the
// workshop's common-practice ranges (warnings) and what can be measured at all (422), signed by the
// builder and, when the workshop asks for it, by the owner. A signed revision is locked; reopening
// starts the next revision. A client sees only signed revisions.
import type { WorkshopScope } from "@/lib/auth/scope";
import { can } from "@/lib/auth/permissions";
import { AppError, conflict, forbidden, notFound } from "@/lib/http/errors";
import type { SetupSheet } from "@/lib/schemas/setup-sheet";
import type { SetupSheetView } from "@/lib/schemas/setup-sheet-out";
import { checkSetupSheet } from "@/lib/setup/checks";
import { setupFigures, specStrings } from "@/lib/setup/figures";
import { setupSummaryLines } from "@/lib/setup/summary";
import { FINAL_SETUP, stageLabel } from "@/lib/workflow/stages";
import { writeAudit } from "./audit";
import { getVisibleCommissionRow, visibleCommissions, type CommissionRow } from "./commission-access";
import { getWorkshopSetupRanges } from "./setup-ranges";
import { approvedSpecVersion, currentSheetRow, latestSignedSheetRow, sheetRows, sheetStatus, toRevision, type ApprovedSpec, type SheetRow } from "./setup-sheet-rows";
import { inTransaction, type Trx } from "./transaction";
import { getWorkshopSettings, type WorkshopSettings } from "./workshop-settings";

interface Context {
  row: CommissionRow;
  settings: WorkshopSettings;
  approved: ApprovedSpec | null;
}

async function loadContext(trx: Trx, scope: WorkshopScope, commissionId: number, forUpdate = false): Promise<Context> {
  const row = await getVisibleCommissionRow(scope, commissionId, { trx, forUpdate });
  const settings = await getWorkshopSettings(scope, trx);
  return { row, settings, approved: await approvedSpecVersion(trx, scope, commissionId) };
}

/** Why the sheet cannot be changed now (null when it can). */
function closedReason(ctx: Context): string | null {
  if (ctx.row.stage !== FINAL_SETUP) {
    return `The setup sheet is filled in and signed during final setup; this commission is at ${stageLabel(ctx.row.stage, ctx.settings.buildStages)}.`;
  }
  if (!ctx.approved) return "The commission has no approved spec to measure against.";
  return null;
}

function assertOpen(ctx: Context) {
  const reason = closedReason(ctx);
  if (reason) throw conflict(reason);
}

const familyOf = (ctx: Context) => ctx.approved?.result.family ?? "guitar";

async function buildView(trx: Trx, scope: WorkshopScope, ctx: Context, revision?: number): Promise<SetupSheetView> {
  const client = scope.role === "client";
  const current = await currentSheetRow(trx, scope, ctx.row.id);
  let shown: SheetRow | null;
  if (revision !== undefined) {
    const q = sheetRows(trx, scope, ctx.row.id).where("s.revision", revision);
    if (client) q.whereNotNull("s.signed_at");
    shown = ((await q.first()) as SheetRow | undefined) ?? null;
    if (!shown) throw notFound("No such revision of the setup sheet.");
  } else {
    shown = client ? await latestSignedSheetRow(trx, scope, ctx.row.id) : current;
  }
  const all = sheetRows(trx, scope, ctx.row.id).orderBy("s.revision", "asc");
  if (client) all.whereNotNull("s.signed_at");
  const revisions = ((await all) as SheetRow[]).map((r) => ({ revision: Number(r.revision), status: sheetStatus(r), signedAt: toRevision(r).signedAt }));

  const { ranges, customised } = await getWorkshopSetupRanges(scope, trx);
  const family = familyOf(ctx);
  const strings = ctx.approved ? specStrings(ctx.approved.result) : [];
  const sheet = shown ? toRevision(shown) : null;
  const isCurrent = !!shown && !!current && shown.id === current.id;
  const reason = closedReason(ctx);
  const open = reason === null && !client;
  const locked = !!current?.builder_signed_at;
  const signature = sheet && { revision: sheet.revision, builderName: sheet.builderSignedBy?.name ?? null, ownerName: sheet.ownerSignedBy?.name ?? null, signedAt: sheet.signedAt };
  return {
    commission: { id: ctx.row.id, number: ctx.row.number, title: ctx.row.title, stage: ctx.row.stage, stageLabel: stageLabel(ctx.row.stage, ctx.settings.buildStages) },
    unit: ctx.settings.unitPreference,
    family,
    spec: ctx.approved ? { versionId: ctx.approved.id, version: ctx.approved.version, strings, pickups: ctx.approved.spec.pickups.map((p) => p.label) } : null,
    ranges: ranges[family],
    rangesCustomised: customised,
    requireOwnerSignoff: ctx.settings.requireStageSignoff,
    sheet,
    isCurrent,
    revisions,
    figures: sheet ? setupFigures(sheet.values, strings) : [],
    issues: sheet ? checkSetupSheet(sheet.values, ranges[family], { stringCount: strings.length, strings, unit: ctx.settings.unitPreference }) : [],
    summary: sheet ? setupSummaryLines(sheet.values, ctx.settings.unitPreference, signature ?? undefined) : [],
    can: {
      edit: open && can(scope.role, "setup.write") && (revision === undefined || isCurrent) && !locked,
      sign:
        open &&
        can(scope.role, "setup.signoff") &&
        !!current &&
        !current.signed_at &&
        (!current.builder_signed_at || scope.role === "owner" || !ctx.settings.requireStageSignoff),
      reopen: open && can(scope.role, "setup.write") && locked,
    },
    lockedReason: client ? null : (reason ?? (locked ? `Revision ${current!.revision} is signed and locked; reopen it to change anything (that starts a new revision).` : null)),
  };
}

/** The sheet as the caller may see it: the current revision (a client: the latest signed one). */
export async function getSetupSheetView(scope: WorkshopScope, commissionId: number, opts: { revision?: number } = {}): Promise<SetupSheetView> {
  return inTransaction(async (trx) => buildView(trx, scope, await loadContext(trx, scope, commissionId), opts.revision));
}

function mayWrite(scope: WorkshopScope) {
  if (!can(scope.role, "setup.write")) throw forbidden("Only the workshop's builders and owner fill in the setup sheet.");
}

/**
 * Saves the current draft (revision 1 when there is none). Impossible values are refused with 422
 * and their field paths, and nothing is stored; values outside the common-practice ranges are saved
 * and come back as warnings.
 */
export async function saveSetupSheet(scope: WorkshopScope, commissionId: number, values: SetupSheet): Promise<SetupSheetView> {
  mayWrite(scope);
  return inTransaction(async (trx) => {
    const ctx = await loadContext(trx, scope, commissionId, true);
    assertOpen(ctx);
    const current = await currentSheetRow(trx, scope, commissionId, true);
    if (current?.builder_signed_at) throw conflict(`Revision ${current.revision} is signed and locked; reopen it to change anything.`);
    const { ranges } = await getWorkshopSetupRanges(scope, trx);
    const strings = specStrings(ctx.approved!.result);
    const errors = checkSetupSheet(values, ranges[familyOf(ctx)], { stringCount: strings.length, strings, unit: ctx.settings.unitPreference }).filter((i) => i.level === "error");
    if (errors.length) {
      throw new AppError("validation_failed", "Some measurements cannot be right; nothing was saved.", errors.map(({ path, message }) => ({ path, message })));
    }
    const stored = { sheet_values: JSON.stringify(values), spec_version_id: ctx.approved!.id, updated_by: scope.userId };
    let revision = current?.revision ?? 1;
    if (current) {
      await trx("setup_sheets").where({ id: current.id, workshop_id: scope.workshopId }).update(stored);
    } else {
      await trx("setup_sheets").insert({ workshop_id: scope.workshopId, commission_id: commissionId, revision: 1, created_by: scope.userId, ...stored });
      revision = 1;
    }
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "setup.saved", entityType: "commission", entityId: commissionId, data: { revision } });
    return buildView(trx, scope, ctx);
  });
}

/**
 * Signs the current revision. The first sign-off (builder, or the owner acting as one) locks it;
 * it counts as signed when the owner has signed too, if the workshop requires that.
 */
export async function signSetupSheet(scope: WorkshopScope, commissionId: number, revision: number): Promise<SetupSheetView> {
  if (!can(scope.role, "setup.signoff")) throw forbidden("Only the builder or the owner signs the setup sheet.");
  return inTransaction(async (trx) => {
    const ctx = await loadContext(trx, scope, commissionId, true);
    assertOpen(ctx);
    const current = await currentSheetRow(trx, scope, commissionId, true);
    if (!current) throw conflict("Fill in and save the setup sheet before signing it.");
    if (Number(current.revision) !== revision) throw conflict(`The sheet is at revision ${current.revision} now; look at it again before signing.`);
    if (current.signed_at) throw conflict(`Revision ${current.revision} is already signed.`);
    const owner = scope.role === "owner";
    const now = trx.fn.now(3);
    const update: Record<string, unknown> = {};
    if (!current.builder_signed_at) {
      update.builder_signed_at = now;
      update.builder_signed_by = scope.userId;
    } else if (!owner && ctx.settings.requireStageSignoff) {
      throw forbidden("The builder has signed; the workshop's owner signs it off now.");
    }
    if (owner) {
      update.owner_signed_at = now;
      update.owner_signed_by = scope.userId;
    }
    const complete = owner || !ctx.settings.requireStageSignoff;
    if (complete) update.signed_at = now;
    await trx("setup_sheets").where({ id: current.id, workshop_id: scope.workshopId }).update(update);
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "setup.signed", entityType: "commission", entityId: commissionId, data: { revision, complete, as: owner ? "owner" : "builder" } });
    return buildView(trx, scope, ctx);
  });
}

/** Reopens a locked sheet: the next revision starts as a copy, with the reason noted. */
export async function reopenSetupSheet(scope: WorkshopScope, commissionId: number, note: string): Promise<SetupSheetView> {
  mayWrite(scope);
  return inTransaction(async (trx) => {
    const ctx = await loadContext(trx, scope, commissionId, true);
    assertOpen(ctx);
    const current = await currentSheetRow(trx, scope, commissionId, true);
    if (!current) throw conflict("There is no setup sheet to reopen yet.");
    if (!current.builder_signed_at) throw conflict(`Revision ${current.revision} is still open; change it directly.`);
    const next = Number(current.revision) + 1;
    await trx("setup_sheets").insert({
      workshop_id: scope.workshopId,
      commission_id: commissionId,
      revision: next,
      spec_version_id: ctx.approved!.id,
      sheet_values: typeof current.sheet_values === "string" ? current.sheet_values : JSON.stringify(current.sheet_values),
      reopen_note: note,
      created_by: scope.userId,
      updated_by: scope.userId,
    });
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "setup.reopened", entityType: "commission", entityId: commissionId, data: { revision: next, note } });
    return buildView(trx, scope, ctx);
  });
}

/** A signed revision's summary lines in the workshop's unit, with who signed it and when. */
function signedSummaryLines(row: SheetRow, settings: WorkshopSettings): { revision: number; signedAt: string | null; lines: string[] } {
  const r = toRevision(row);
  const signature = { revision: r.revision, builderName: r.builderSignedBy?.name ?? null, ownerName: r.ownerSignedBy?.name ?? null, signedAt: r.signedAt };
  return { revision: r.revision, signedAt: r.signedAt, lines: setupSummaryLines(r.values, settings.unitPreference, signature) };
}

/** The summary lines of the current revision when it is signed (for the delivery e-mail). */
export async function setupSummaryForDelivery(trx: Trx, scope: WorkshopScope, commissionId: number, settings: WorkshopSettings): Promise<string[]> {
  const current = await currentSheetRow(trx, scope, commissionId);
  if (!current?.signed_at) return [];
  return signedSummaryLines(current, settings).lines;
}

/**
 * The latest signed revision's summary, as the commission's overview shows it to everyone who may
 * see the commission (null until a revision is signed; a reopened sheet keeps showing the last one).
 */
export async function getSignedSetupSummary(scope: WorkshopScope, commissionId: number): Promise<{ revision: number; signedAt: string | null; lines: string[] } | null> {
  return inTransaction(async (trx) => {
    await getVisibleCommissionRow(scope, commissionId, { trx });
    const row = await latestSignedSheetRow(trx, scope, commissionId);
    return row ? signedSummaryLines(row, await getWorkshopSettings(scope, trx)) : null;
  });
}

export interface SetupQueueItem {
  id: number;
  number: string;
  title: string;
  stage: string;
  stageLabel: string;
  revision: number | null;
  status: "none" | "draft" | "awaiting_owner" | "signed";
}

/** Commissions in final setup or delivered that the caller may see, with where their sheet stands. */
export async function listSetupQueue(scope: WorkshopScope): Promise<SetupQueueItem[]> {
  return inTransaction(async (trx) => {
    const settings = await getWorkshopSettings(scope, trx);
    const latest = trx("setup_sheets")
      .where("workshop_id", scope.workshopId)
      .groupBy("commission_id")
      .select("commission_id", trx.raw("MAX(revision) AS revision"), trx.raw("MAX(CASE WHEN signed_at IS NOT NULL THEN revision END) AS signed_revision"))
      .as("l");
    const rows = (await visibleCommissions(scope, trx)
      .whereIn("c.stage", [FINAL_SETUP, "delivered"])
      .leftJoin(latest, "l.commission_id", "c.id")
      .leftJoin("setup_sheets as s", function () {
        this.on("s.commission_id", "=", "c.id").andOn("s.revision", "=", "l.revision");
      })
      .orderByRaw("c.stage = ? desc", [FINAL_SETUP])
      .orderBy("c.updated_at", "desc")
      .limit(200)
      .select("c.id", "c.number", "c.title", "c.stage", "s.revision", "s.builder_signed_at", "s.signed_at", "l.signed_revision")) as Array<{
      id: number;
      number: string;
      title: string;
      stage: string;
      revision: number | null;
      signed_revision: number | null;
      builder_signed_at: Date | null;
      signed_at: Date | null;
    }>;
    return rows.map((r) => {
      const base = { id: Number(r.id), number: r.number, title: r.title, stage: r.stage, stageLabel: stageLabel(r.stage, settings.buildStages) };
      // A client hears only of signed sheets.
      if (scope.role === "client") return { ...base, revision: r.signed_revision === null ? null : Number(r.signed_revision), status: r.signed_revision === null ? "none" : "signed" };
      return { ...base, revision: r.revision === null ? null : Number(r.revision), status: r.revision === null ? "none" : sheetStatus(r) };
    });
  });
}
