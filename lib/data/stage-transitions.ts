// Moving a commission between stages: load the guards' facts, ask the pure stage machine, then
// store the move, its history line, the audit entry and the client's e-mail in one transaction.
import type { WorkshopScope } from "@/lib/auth/scope";
import { appLink } from "@/lib/auth/links";
import { AppError, forbidden, notFound } from "@/lib/http/errors";
import { enqueueEmail } from "@/lib/outbox/enqueue";
import type { TemplateName } from "@/lib/outbox/templates";
import type { StageHistoryEntry, TransitionOption } from "@/lib/schemas/commission-out";
import { availableTransitions, planTransition, type Actor, type GuardFacts, type PlannedTransition, type TransitionAction } from "@/lib/workflow/machine";
import { DELIVERED, DEPOSIT, FINAL_SETUP, SPEC, stageLabel, type BuildStage } from "@/lib/workflow/stages";
import { writeAudit } from "./audit";
import { getVisibleCommissionRow, type CommissionRow } from "./commission-access";
import { paidFlags, paymentTotals } from "./payment-totals";
import { setupSummaryForDelivery } from "./setup-sheets";
import { isSetupSheetSigned } from "./setup-status";
import { inTransaction, iso, type Trx } from "./transaction";
import { getWorkshopSettings, type WorkshopSettings } from "./workshop-settings";

/** Everything the guards need about one commission, read inside the caller's transaction. */
export async function loadGuardFacts(trx: Trx, scope: WorkshopScope, row: CommissionRow, settings: WorkshopSettings): Promise<GuardFacts> {
  const versions = await trx("spec_versions")
    .where({ workshop_id: scope.workshopId, commission_id: row.id })
    .orderBy("version", "desc")
    .select("id", "version", "approved_at", "has_errors");
  const approved = versions.find((v: { approved_at: Date | null }) => v.approved_at !== null);
  const totals = await paymentTotals(trx, scope.workshopId, row.id);
  const { depositPaid, balancePaid } = paidFlags(totals, row);
  return {
    template: settings.buildStages,
    approvedSpec: approved ? { id: approved.id, hasErrors: !!approved.has_errors } : null,
    newerUnapprovedSpec: !!approved && versions[0]!.id !== approved.id,
    depositPaid,
    balancePaid,
    setupSheetSigned: await isSetupSheetSigned(trx, scope.workshopId, row.id),
    requireOwnerSignoff: settings.requireStageSignoff,
  };
}

export function actorFor(scope: WorkshopScope, row: CommissionRow): Actor {
  return { role: scope.role, isAssignedBuilder: row.builder_user_id === scope.userId, isCommissionClient: row.client_user_id === scope.userId };
}

/** Which e-mail tells the client of a move (null: nothing they need to hear). */
export function emailForMove(t: Pick<PlannedTransition, "kind" | "from" | "to">): TemplateName | null {
  if (t.kind === "hold") return "on-hold";
  if (t.kind === "resume") return "resumed";
  if (t.kind === "cancel") return "cancelled";
  if (t.to === DEPOSIT && t.from === SPEC) return "deposit-requested";
  if (t.from === DEPOSIT && t.kind === "advance") return "build-started";
  if (t.to === FINAL_SETUP && t.kind === "advance") return "final-setup";
  if (t.to === DELIVERED) return "delivered";
  return "stage-progress";
}

/** Queues a commission e-mail to its client inside `trx`. */
export async function emailClient(
  trx: Trx,
  scope: WorkshopScope,
  row: CommissionRow,
  template: TemplateName,
  settings: WorkshopSettings,
  extra: { stage: string; note?: string | null; setupSummary?: string[] },
): Promise<void> {
  const client = await trx("users").where({ id: row.client_user_id }).first("email", "name");
  const props = {
    workshopName: settings.emailSenderName || settings.name,
    clientName: client.name,
    commissionNumber: row.number,
    commissionTitle: row.title,
    stageLabel: stageLabel(extra.stage, settings.buildStages),
    commissionUrl: appLink(`/${settings.slug}/commissions/${row.id}`),
    ...(extra.note ? { note: extra.note } : {}),
    ...(template === "delivered" ? { setupSummary: extra.setupSummary ?? [] } : {}),
  };
  // The template name picks the props schema; all commission e-mails share this shape.
  await enqueueEmail(trx, { workshopId: scope.workshopId, to: client.email, template, props } as Parameters<typeof enqueueEmail>[1]);
}

/**
 * Stores a planned move: the commission's stage (and what the client has been told), the history
 * line, the audit entry and, when the client is to be told, their e-mail.
 */
export async function applyTransition(
  trx: Trx,
  scope: WorkshopScope,
  row: CommissionRow,
  planned: PlannedTransition,
  settings: WorkshopSettings,
  note: string | null,
  extra: { setupSummary?: string[] } = {},
): Promise<number> {
  const update: Record<string, unknown> = { stage: planned.to, held_from: planned.heldFrom, stage_entered_at: trx.fn.now(3) };
  if (planned.notifyClient) update.client_stage = planned.to;
  await trx("commissions").where({ id: row.id, workshop_id: scope.workshopId }).update(update);
  const [historyId] = await trx("stage_history").insert({
    workshop_id: scope.workshopId,
    commission_id: row.id,
    from_stage: planned.from,
    to_stage: planned.to,
    kind: planned.kind,
    actor_user_id: scope.userId,
    note,
    needs_signoff: planned.needsOwnerSignoff,
    client_notified_at: planned.notifyClient ? trx.fn.now(3) : null,
  });
  await writeAudit(trx, {
    workshopId: scope.workshopId,
    actorUserId: scope.userId,
    action: "commission.stage_changed",
    entityType: "commission",
    entityId: row.id,
    data: { from: planned.from, to: planned.to, kind: planned.kind, needsOwnerSignoff: planned.needsOwnerSignoff },
  });
  const template = planned.notifyClient ? emailForMove(planned) : null;
  if (template) await emailClient(trx, scope, row, template, settings, { stage: planned.to, note, setupSummary: extra.setupSummary });
  return Number(historyId);
}

/** Moves a commission (409 with the reason when a guard refuses, 403 when this person may not). */
export async function transitionCommission(scope: WorkshopScope, id: number, action: TransitionAction, note: string | null) {
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, id, { trx, forUpdate: true });
    const settings = await getWorkshopSettings(scope, trx);
    const facts = await loadGuardFacts(trx, scope, row, settings);
    const planned = planTransition({ stage: row.stage, heldFrom: row.held_from }, action, facts, actorFor(scope, row));
    if (!planned.ok) {
      if (planned.kind === "forbidden") throw forbidden(planned.reason);
      throw new AppError("conflict", planned.reason, planned.missing?.map((m) => ({ path: "stage", message: m })));
    }
    // The delivery e-mail carries the signed setup sheet's summary.
    const setupSummary = planned.to === DELIVERED ? await setupSummaryForDelivery(trx, scope, row.id, settings) : undefined;
    const historyId = await applyTransition(trx, scope, row, planned, settings, note, { setupSummary });
    return { historyId, from: planned.from, to: planned.to, needsOwnerSignoff: planned.needsOwnerSignoff };
  });
}

/** The owner signs off a builder's move: the client sees the new stage and gets the e-mail. */
export async function signOffStage(scope: WorkshopScope, commissionId: number, historyId: number) {
  if (scope.role !== "owner") throw forbidden("Only the owner signs off stages.");
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, commissionId, { trx, forUpdate: true });
    const h = await trx("stage_history").where({ id: historyId, workshop_id: scope.workshopId, commission_id: commissionId }).forUpdate().first();
    if (!h) throw notFound("No such stage change.");
    if (!h.needs_signoff || h.signed_off_at) throw new AppError("conflict", "This stage change does not wait for a sign-off.");
    const settings = await getWorkshopSettings(scope, trx);
    await trx("stage_history").where({ id: historyId }).update({ signed_off_at: trx.fn.now(3), signed_off_by: scope.userId, client_notified_at: trx.fn.now(3) });
    // Earlier unsigned moves of the same commission are covered by this later one.
    await trx("stage_history")
      .where({ workshop_id: scope.workshopId, commission_id: commissionId, needs_signoff: true })
      .whereNull("signed_off_at")
      .where("id", "<", historyId)
      .update({ signed_off_at: trx.fn.now(3), signed_off_by: scope.userId });
    // The client hears of the stage the commission is in now, if this sign-off reaches it.
    const latestPending = await trx("stage_history")
      .where({ workshop_id: scope.workshopId, commission_id: commissionId, needs_signoff: true })
      .whereNull("signed_off_at")
      .first("id");
    const tellStage = latestPending ? h.to_stage : row.stage;
    await trx("commissions").where({ id: commissionId, workshop_id: scope.workshopId }).update({ client_stage: tellStage });
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "commission.stage_signed_off", entityType: "commission", entityId: commissionId, data: { historyId } });
    const template = emailForMove({ kind: h.kind, from: h.from_stage, to: tellStage });
    if (template) await emailClient(trx, scope, row, template, settings, { stage: tellStage, note: h.note });
    return { clientStage: tellStage };
  });
}

/** The commission's stage history as the caller may see it (a client: only what they were told). */
export async function listStageHistory(scope: WorkshopScope, commissionId: number): Promise<StageHistoryEntry[]> {
  return inTransaction(async (trx) => {
    await getVisibleCommissionRow(scope, commissionId, { trx });
    const settings = await getWorkshopSettings(scope, trx);
    const q = trx("stage_history as h")
      .leftJoin("users as u", "u.id", "h.actor_user_id")
      .where({ "h.workshop_id": scope.workshopId, "h.commission_id": commissionId })
      .orderBy("h.created_at", "asc")
      .orderBy("h.id", "asc")
      .select("h.*", "u.name as actor_name");
    if (scope.role === "client") q.whereNotNull("h.client_notified_at");
    const rows = await q;
    return rows.map((h: Record<string, unknown>) => ({
      id: Number(h.id),
      from: (h.from_stage as string | null) ?? null,
      fromLabel: h.from_stage ? stageLabel(h.from_stage as string, settings.buildStages) : null,
      to: h.to_stage as string,
      toLabel: stageLabel(h.to_stage as string, settings.buildStages),
      kind: h.kind as string,
      actor: h.actor_user_id ? { id: Number(h.actor_user_id), name: String(h.actor_name ?? "") } : null,
      note: (h.note as string | null) ?? null,
      needsSignoff: !!h.needs_signoff,
      signedOffAt: h.signed_off_at ? iso(h.signed_off_at as Date) : null,
      createdAt: iso(h.created_at as Date),
    }));
  });
}

/** The moves the caller could make now, with the reason for each refusal (for the buttons). */
export async function transitionOptions(trx: Trx, scope: WorkshopScope, row: CommissionRow, settings: WorkshopSettings): Promise<TransitionOption[]> {
  const facts = await loadGuardFacts(trx, scope, row, settings);
  const template: readonly BuildStage[] = settings.buildStages;
  return availableTransitions({ stage: row.stage, heldFrom: row.held_from }, facts, actorFor(scope, row)).map(({ action, result }) => ({
    action,
    to: result.ok ? result.to : null,
    toLabel: result.ok ? stageLabel(result.to, template) : null,
    allowed: result.ok,
    reason: result.ok ? null : result.reason,
    missing: result.ok ? [] : (result.missing ?? []),
    missingGuards: result.ok ? [] : (result.missingGuards ?? []),
  }));
}
