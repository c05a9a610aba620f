// Reading setup-sheet revisions and what they are measured against (the commission's approved
// spec version), for lib/data/setup-sheets.ts and the printouts. Every query carries the workshop.
import type { WorkshopScope } from "@/lib/auth/scope";
import type { ComputeResult, InstrumentSpec } from "@/lib/schemas/instrument-spec";
import type { SetupSheet } from "@/lib/schemas/setup-sheet";
import type { SetupSheetRevision, SetupSheetStatus } from "@/lib/schemas/setup-sheet-out";
import { iso, type Trx } from "./transaction";

export interface SheetRow {
  id: number;
  commission_id: number;
  revision: number;
  spec_version_id: number | null;
  spec_version: number | null;
  sheet_values: unknown;
  reopen_note: string | null;
  created_at: Date;
  updated_at: Date;
  updated_by: number;
  updated_by_name: string;
  builder_signed_at: Date | null;
  builder_signed_by: number | null;
  builder_name: string | null;
  owner_signed_at: Date | null;
  owner_signed_by: number | null;
  owner_name: string | null;
  signed_at: Date | null;
}

export interface ApprovedSpec {
  id: number;
  version: number;
  approvedAt: string;
  spec: InstrumentSpec;
  result: ComputeResult;
}

const parseJson = <T>(v: unknown): T => (typeof v === "string" ? (JSON.parse(v) as T) : (v as T));

/** Revisions of one commission's sheet, with the names of who changed and signed them. */
export function sheetRows(trx: Trx, scope: WorkshopScope, commissionId: number) {
  return trx("setup_sheets as s")
    .join("users as u", "u.id", "s.updated_by")
    .leftJoin("users as b", "b.id", "s.builder_signed_by")
    .leftJoin("users as o", "o.id", "s.owner_signed_by")
    .leftJoin("spec_versions as v", function () {
      this.on("v.id", "=", "s.spec_version_id").andOn("v.workshop_id", "=", "s.workshop_id");
    })
    .where({ "s.workshop_id": scope.workshopId, "s.commission_id": commissionId })
    .select("s.*", "u.name as updated_by_name", "b.name as builder_name", "o.name as owner_name", "v.version as spec_version");
}

/** The current (highest) revision, locked for update when asked. */
export async function currentSheetRow(trx: Trx, scope: WorkshopScope, commissionId: number, forUpdate = false): Promise<SheetRow | null> {
  const q = sheetRows(trx, scope, commissionId).orderBy("s.revision", "desc").first();
  if (forUpdate) q.forUpdate();
  return ((await q) as SheetRow | undefined) ?? null;
}

/** The latest revision that is fully signed (what a client sees). */
export async function latestSignedSheetRow(trx: Trx, scope: WorkshopScope, commissionId: number): Promise<SheetRow | null> {
  return ((await sheetRows(trx, scope, commissionId).whereNotNull("s.signed_at").orderBy("s.revision", "desc").first()) as SheetRow | undefined) ?? null;
}

export function sheetStatus(r: Pick<SheetRow, "builder_signed_at" | "signed_at">): SetupSheetStatus {
  if (r.signed_at) return "signed";
  return r.builder_signed_at ? "awaiting_owner" : "draft";
}

const person = (id: number | null, name: string | null) => (id === null ? null : { id: Number(id), name: name ?? "" });
const when = (d: Date | null) => (d ? iso(d) : null);

export function toRevision(r: SheetRow): SetupSheetRevision {
  return {
    id: Number(r.id),
    revision: Number(r.revision),
    status: sheetStatus(r),
    values: parseJson<SetupSheet>(r.sheet_values),
    specVersion: r.spec_version === null ? null : Number(r.spec_version),
    reopenNote: r.reopen_note,
    createdAt: iso(r.created_at),
    updatedAt: iso(r.updated_at),
    updatedBy: { id: Number(r.updated_by), name: r.updated_by_name },
    builderSignedAt: when(r.builder_signed_at),
    builderSignedBy: person(r.builder_signed_by, r.builder_name),
    ownerSignedAt: when(r.owner_signed_at),
    ownerSignedBy: person(r.owner_signed_by, r.owner_name),
    signedAt: when(r.signed_at),
  };
}

/** The latest spec version the client approved (what the setup and the printouts work to). */
export async function approvedSpecVersion(trx: Trx, scope: WorkshopScope, commissionId: number): Promise<ApprovedSpec | null> {
  const v = await trx("spec_versions")
    .where({ workshop_id: scope.workshopId, commission_id: commissionId })
    .whereNotNull("approved_at")
    .orderBy("version", "desc")
    .first("id", "version", "approved_at", "spec", "result");
  if (!v) return null;
  return { id: Number(v.id), version: Number(v.version), approvedAt: iso(v.approved_at), spec: parseJson(v.spec), result: parseJson(v.result) };
}
