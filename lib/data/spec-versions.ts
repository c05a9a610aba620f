// Spec versions of a commission: drafted by the workshop, each stored with its computed results,
// sent to the client, approved (which locks it). A change after approval is a new version.
import type { WorkshopScope } from "@/lib/auth/scope";
import { AppError, forbidden, notFound } from "@/lib/http/errors";
import type { BuildOptions } from "@/lib/schemas/build-options";
import type { ComputeResult, InstrumentSpec } from "@/lib/schemas/instrument-spec";
import type { SpecVersionDetail, SpecVersionSummary } from "@/lib/schemas/spec-version";
import { planTransition } from "@/lib/workflow/machine";
import { summariseSpecChange } from "@/lib/workflow/spec-diff";
import { CANCELLED, DELIVERED, SPEC } from "@/lib/workflow/stages";
import { writeAudit } from "./audit";
import { getVisibleCommissionRow, type CommissionRow } from "./commission-access";
import { specVersionColumns } from "./spec-version-columns";
import { actorFor, applyTransition, emailClient, loadGuardFacts } from "./stage-transitions";
import { inTransaction, iso, type Trx } from "./transaction";
import { getWorkshopSettings } from "./workshop-settings";

interface VersionRow {
  id: number;
  commission_id: number;
  version: number;
  spec: InstrumentSpec;
  options: BuildOptions;
  result: ComputeResult;
  has_errors: number | boolean;
  total_tension_n: number;
  created_by: number;
  created_by_name: string;
  created_at: Date;
  submitted_at: Date | null;
  approved_at: Date | null;
  approved_by: number | null;
}

const parseJson = <T>(v: unknown): T => (typeof v === "string" ? (JSON.parse(v) as T) : (v as T));

function toSummary(r: VersionRow): SpecVersionSummary {
  const result = parseJson<ComputeResult>(r.result);
  return {
    id: r.id,
    version: r.version,
    createdAt: iso(r.created_at),
    createdBy: { id: r.created_by, name: r.created_by_name },
    submittedAt: r.submitted_at ? iso(r.submitted_at) : null,
    approvedAt: r.approved_at ? iso(r.approved_at) : null,
    hasErrors: !!r.has_errors,
    warningCount: result.issues.filter((i) => i.level === "warning").length,
    errorCount: result.issues.filter((i) => i.level === "error").length,
    totalTensionN: Number(r.total_tension_n),
  };
}

function versions(trx: Trx, scope: WorkshopScope, commissionId: number) {
  const q = trx("spec_versions as v")
    .join("users as u", "u.id", "v.created_by")
    .where({ "v.workshop_id": scope.workshopId, "v.commission_id": commissionId })
    .select("v.*", "u.name as created_by_name");
  // A client sees what the workshop has sent them, not its drafts.
  if (scope.role === "client") q.whereNotNull("v.submitted_at");
  return q;
}

const isOpen = (row: CommissionRow) => row.stage !== DELIVERED && row.stage !== CANCELLED;

/** Saves a new version with its computed results (the spec as drafted, never edited in place). */
export async function createSpecVersion(scope: WorkshopScope, commissionId: number, input: { spec: InstrumentSpec; options: BuildOptions }): Promise<SpecVersionSummary> {
  if (scope.role !== "owner" && scope.role !== "builder") throw forbidden("Only the workshop drafts specs.");
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, commissionId, { trx, forUpdate: true });
    if (!isOpen(row)) throw new AppError("conflict", "The commission is closed; its spec cannot change any more.");
    const last = await trx("spec_versions").where({ workshop_id: scope.workshopId, commission_id: commissionId }).max({ v: "version" }).first();
    const version = Number(last?.v ?? 0) + 1;
    const [id] = await trx("spec_versions").insert({
      workshop_id: scope.workshopId,
      commission_id: commissionId,
      version,
      ...specVersionColumns(input.spec, input.options),
      created_by: scope.userId,
    });
    await trx("commissions").where({ id: commissionId, workshop_id: scope.workshopId }).update({ updated_at: trx.fn.now(3) });
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "spec.drafted", entityType: "commission", entityId: commissionId, data: { version } });
    const saved = (await versions(trx, scope, commissionId).where("v.id", Number(id)).first()) as VersionRow;
    return toSummary(saved);
  });
}

export async function listSpecVersions(scope: WorkshopScope, commissionId: number): Promise<SpecVersionSummary[]> {
  return inTransaction(async (trx) => {
    await getVisibleCommissionRow(scope, commissionId, { trx });
    const rows = (await versions(trx, scope, commissionId).orderBy("v.version", "desc")) as VersionRow[];
    return rows.map(toSummary);
  });
}

async function loadVersion(trx: Trx, scope: WorkshopScope, commissionId: number, versionId: number): Promise<VersionRow> {
  const r = (await versions(trx, scope, commissionId).where("v.id", versionId).first()) as VersionRow | undefined;
  if (!r) throw notFound("No such spec version.");
  return r;
}

/** One version in full, with what changed against the version the client approved before it. */
export async function getSpecVersion(scope: WorkshopScope, commissionId: number, versionId: number): Promise<SpecVersionDetail> {
  return inTransaction(async (trx) => {
    await getVisibleCommissionRow(scope, commissionId, { trx });
    const r = await loadVersion(trx, scope, commissionId, versionId);
    const base = (await versions(trx, scope, commissionId)
      .whereNotNull("v.approved_at")
      .where("v.version", "<", r.version)
      .orderBy("v.version", "desc")
      .first()) as VersionRow | undefined;
    const spec = parseJson<InstrumentSpec>(r.spec);
    const options = parseJson<BuildOptions>(r.options);
    const change = base
      ? {
          againstVersion: base.version,
          ...summariseSpecChange({
            before: { spec: parseJson(base.spec), options: parseJson(base.options) },
            after: { spec, options },
            beforeTotalTensionN: Number(base.total_tension_n),
            afterTotalTensionN: Number(r.total_tension_n),
            bridge: options.bridge,
          }),
        }
      : null;
    return { ...toSummary(r), spec, options, result: parseJson<ComputeResult>(r.result), change };
  });
}

async function latestVersionId(trx: Trx, scope: WorkshopScope, commissionId: number): Promise<number | null> {
  const r = await trx("spec_versions").where({ workshop_id: scope.workshopId, commission_id: commissionId }).orderBy("version", "desc").first("id");
  return r ? Number(r.id) : null;
}

/** Sends the latest version to the client for approval (and tells them by e-mail). */
export async function submitSpecVersion(scope: WorkshopScope, commissionId: number, versionId: number, note: string | null) {
  if (scope.role !== "owner" && scope.role !== "builder") throw forbidden("Only the workshop sends specs for approval.");
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, commissionId, { trx, forUpdate: true });
    const v = await loadVersion(trx, scope, commissionId, versionId);
    if (!isOpen(row)) throw new AppError("conflict", "The commission is closed.");
    if (v.approved_at) throw new AppError("conflict", "This version is already approved.");
    if ((await latestVersionId(trx, scope, commissionId)) !== v.id) throw new AppError("conflict", "Only the latest version can be sent; a newer one exists.");
    if (v.has_errors) throw new AppError("conflict", "This version has errors in its build math; correct them in a new version before sending it.");
    await trx("spec_versions").where({ id: v.id, workshop_id: scope.workshopId }).update({ submitted_at: trx.fn.now(3) });
    const settings = await getWorkshopSettings(scope, trx);
    await emailClient(trx, scope, row, "spec-ready", settings, { stage: row.client_stage, note });
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "spec.submitted", entityType: "commission", entityId: commissionId, data: { version: v.version } });
    return { submitted: true };
  });
}

/**
 * The client approves the version sent to them: it is locked, and a commission still in the spec
 * stage moves on to the deposit.
 */
export async function approveSpecVersion(scope: WorkshopScope, commissionId: number, versionId: number) {
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, commissionId, { trx, forUpdate: true });
    if (scope.role !== "client" || row.client_user_id !== scope.userId) throw forbidden("Only the commission's client approves its spec.");
    const v = await loadVersion(trx, scope, commissionId, versionId);
    if (!isOpen(row)) throw new AppError("conflict", "The commission is closed.");
    if (v.approved_at) throw new AppError("conflict", "You have already approved this version.");
    if (!v.submitted_at) throw new AppError("conflict", "This version has not been sent to you yet.");
    if ((await latestVersionId(trx, scope, commissionId)) !== v.id) throw new AppError("conflict", "A newer version exists; approve that one instead.");
    if (v.has_errors) throw new AppError("conflict", "This version has errors in its build math and cannot be approved.");
    await trx("spec_versions").where({ id: v.id, workshop_id: scope.workshopId }).update({ approved_at: trx.fn.now(3), approved_by: scope.userId });
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "spec.approved", entityType: "commission", entityId: commissionId, data: { version: v.version } });
    let advanced = false;
    if (row.stage === SPEC) {
      const settings = await getWorkshopSettings(scope, trx);
      const facts = await loadGuardFacts(trx, scope, row, settings);
      // The approval is what lets the commission leave the spec stage; the move is the workshop's line.
      const planned = planTransition({ stage: row.stage, heldFrom: row.held_from }, { kind: "advance" }, facts, { ...actorFor(scope, row), role: "owner" });
      if (planned.ok) {
        await applyTransition(trx, scope, row, planned, settings, null);
        advanced = true;
      }
    }
    return { approved: true, advanced };
  });
}
