// Course cohorts: a school's production course (name, dates, builders) and the commissions built
// in it. The owner manages them; a builder sees the cohorts they belong to; progress counts only
// the commissions the caller may see (visibleCommissions).
import type { Knex } from "knex";
import { db } from "@/db/knex";
import { can } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { AppError, forbidden, notFound } from "@/lib/http/errors";
import type { CohortCommission, CohortCreate, CohortDetail, CohortOut, CohortPatch } from "@/lib/schemas/cohort";
import { cohortProgress, isOverdue, openStages } from "@/lib/overview/figures";
import { utcDate } from "@/lib/overview/stats";
import { CANCELLED, DELIVERED, stageLabel, type BuildStage } from "@/lib/workflow/stages";
import { writeAudit } from "./audit";
import { selectCommissionRefs, toCommissionRef, type CommissionRefRow } from "./commission-refs";
import { visibleCommissions } from "./commission-access";
import { overdueCount } from "./overdue-sql";
import { inTransaction, isDuplicateKey, type Trx } from "./transaction";
import { getWorkshopSettings } from "./workshop-settings";

const NO_SUCH_COHORT = "No such cohort.";

interface CohortRow {
  id: number;
  name: string;
  starts_on: Date | string;
  ends_on: Date | string;
}

/** cohorts (aliased `co`) of this workshop that the caller may see: a builder only their own. */
export function visibleCohorts(scope: WorkshopScope, trx?: Trx): Knex.QueryBuilder {
  const q = (trx ?? db)("cohorts as co").where("co.workshop_id", scope.workshopId);
  if (scope.role === "client") q.whereRaw("1 = 0");
  if (scope.role === "builder") {
    q.whereExists((sub) => sub.select(db.raw("1")).from("cohort_builders as cb").whereRaw("cb.cohort_id = co.id").andWhere("cb.user_id", scope.userId));
  }
  return q;
}

/** 422 unless `cohortId` is null or a cohort of this workshop (for a commission's cohort). */
export async function checkCohortOfWorkshop(trx: Trx, scope: WorkshopScope, cohortId: number | null | undefined): Promise<void> {
  if (cohortId === null || cohortId === undefined) return;
  const row = await trx("cohorts").where({ id: cohortId, workshop_id: scope.workshopId }).first("id");
  if (!row) throw new AppError("validation_failed", "Choose a cohort of this workshop.", [{ path: "cohortId", message: "Not a cohort of this workshop." }]);
}

/** Cohorts with their builders and progress, in two grouped queries however many cohorts there are. */
async function withDetails(scope: WorkshopScope, rows: CohortRow[], template: readonly BuildStage[], trx?: Trx): Promise<CohortOut[]> {
  if (rows.length === 0) return [];
  const ids = rows.map((r) => r.id);
  const today = utcDate(new Date());
  const [builders, counts] = await Promise.all([
    (trx ?? db)("cohort_builders as cb")
      .join("users as u", "u.id", "cb.user_id")
      .join("memberships as m", (j) => j.on("m.user_id", "cb.user_id").andOn("m.workshop_id", "cb.workshop_id"))
      .where("cb.workshop_id", scope.workshopId)
      .whereIn("cb.cohort_id", ids)
      .orderBy("u.name")
      .select("cb.cohort_id", "u.id", "u.name") as Promise<Array<{ cohort_id: number; id: number; name: string }>>,
    visibleCommissions(scope, trx)
      .whereIn("c.cohort_id", ids)
      .groupBy("c.cohort_id", "c.stage")
      .select("c.cohort_id", "c.stage", db.raw("COUNT(*) AS n"), overdueCount(today)) as Promise<Array<{ cohort_id: number; stage: string; n: number; overdue: number | null }>>,
  ]);
  const order = [...openStages(template, counts.map((c) => c.stage)).map((s) => s.key), DELIVERED, CANCELLED];
  return rows.map((r) => {
    const mine = counts.filter((c) => c.cohort_id === r.id).map((c) => ({ stage: c.stage, n: Number(c.n), overdue: Number(c.overdue ?? 0) }));
    const p = cohortProgress(mine);
    return {
      id: r.id,
      name: r.name,
      startsOn: utcDate(r.starts_on),
      endsOn: utcDate(r.ends_on),
      builders: builders.filter((b) => b.cohort_id === r.id).map((b) => ({ id: b.id, name: b.name })),
      progress: {
        total: p.total,
        open: p.open,
        overdue: p.overdue,
        delivered: p.delivered,
        cancelled: p.cancelled,
        shareDelivered: p.shareDelivered,
        byStage: order.filter((k) => p.byStage[k]).map((k) => ({ stage: k, label: stageLabel(k, template), n: p.byStage[k]! })),
      },
    };
  });
}

/** The cohorts the caller may see, newest course first. */
export async function listCohorts(scope: WorkshopScope): Promise<CohortOut[]> {
  const settings = await getWorkshopSettings(scope);
  const rows = (await visibleCohorts(scope).orderBy("co.starts_on", "desc").orderBy("co.id", "desc").select("co.id", "co.name", "co.starts_on", "co.ends_on")) as CohortRow[];
  return withDetails(scope, rows, settings.buildStages);
}

async function getCohortRow(scope: WorkshopScope, id: number, trx?: Trx, forUpdate = false): Promise<CohortRow> {
  const q = visibleCohorts(scope, trx).where("co.id", id).first("co.id", "co.name", "co.starts_on", "co.ends_on");
  if (forUpdate) q.forUpdate();
  const row = (await q) as CohortRow | undefined;
  if (!row) throw notFound(NO_SUCH_COHORT);
  return row;
}

/** One cohort with its builders, progress and the commissions in it (those the caller may see). */
export async function getCohortDetail(scope: WorkshopScope, id: number): Promise<CohortDetail> {
  const row = await getCohortRow(scope, id);
  const settings = await getWorkshopSettings(scope);
  const [out] = await withDetails(scope, [row], settings.buildStages);
  const today = utcDate(new Date());
  const rows = (await selectCommissionRefs(visibleCommissions(scope).where("c.cohort_id", id)).orderBy("c.number")) as CommissionRefRow[];
  const commissions: CohortCommission[] = rows.map((c) => {
    const ref = toCommissionRef(c, settings.buildStages);
    return { ...ref, overdue: isOverdue(ref.targetDate, c.stage, today) };
  });
  return { ...out!, commissions };
}

/** Every builder id must be a builder (or the owner) of this workshop: 422 on the first that is not. */
async function checkBuilders(trx: Trx, scope: WorkshopScope, ids: readonly number[]): Promise<void> {
  if (ids.length === 0) return;
  const found = new Set(
    (await trx("memberships").where("workshop_id", scope.workshopId).whereIn("user_id", ids).whereIn("role", ["builder", "owner"]).pluck("user_id")).map(Number),
  );
  const issues = ids.flatMap((id, i) => (found.has(id) ? [] : [{ path: `builderIds.${i}`, message: "Not a builder of this workshop." }]));
  if (issues.length) throw new AppError("validation_failed", "Choose builders of this workshop.", issues);
}

async function replaceBuilders(trx: Trx, scope: WorkshopScope, cohortId: number, ids: readonly number[]): Promise<void> {
  await trx("cohort_builders").where({ workshop_id: scope.workshopId, cohort_id: cohortId }).delete();
  if (ids.length) await trx("cohort_builders").insert(ids.map((user_id) => ({ workshop_id: scope.workshopId, cohort_id: cohortId, user_id })));
}

function requireManage(scope: WorkshopScope) {
  if (!can(scope.role, "cohort.manage")) throw forbidden("Only the owner manages cohorts.");
}

async function reread(scope: WorkshopScope, trx: Trx, id: number): Promise<CohortOut> {
  const settings = await getWorkshopSettings(scope, trx);
  const [out] = await withDetails(scope, [await getCohortRow(scope, id, trx)], settings.buildStages, trx);
  return out!;
}

/** Runs a cohort change, turning a clash on the unique (workshop, name) key into a field error. */
async function withUniqueName<T>(fn: () => Promise<T>): Promise<T> {
  try {
    return await fn();
  } catch (err) {
    if (isDuplicateKey(err)) throw new AppError("validation_failed", "Another cohort already has this name.", [{ path: "name", message: "Another cohort already has this name." }]);
    throw err;
  }
}

export async function createCohort(scope: WorkshopScope, input: CohortCreate): Promise<CohortOut> {
  requireManage(scope);
  return withUniqueName(() =>
    inTransaction(async (trx) => {
      await checkBuilders(trx, scope, input.builderIds);
      const [id] = await trx("cohorts").insert({ workshop_id: scope.workshopId, name: input.name, starts_on: input.startsOn, ends_on: input.endsOn });
      const cohortId = Number(id);
      await replaceBuilders(trx, scope, cohortId, input.builderIds);
      await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "cohort.created", entityType: "cohort", entityId: cohortId, data: input });
      return reread(scope, trx, cohortId);
    }),
  );
}

export async function updateCohort(scope: WorkshopScope, id: number, patch: CohortPatch): Promise<CohortOut> {
  requireManage(scope);
  return withUniqueName(() =>
    inTransaction(async (trx) => {
      const row = await getCohortRow(scope, id, trx, true);
      const startsOn = patch.startsOn ?? utcDate(row.starts_on);
      const endsOn = patch.endsOn ?? utcDate(row.ends_on);
      if (endsOn < startsOn) {
        const path = patch.endsOn ? "endsOn" : "startsOn";
        throw new AppError("validation_failed", "The end date cannot be before the start date.", [{ path, message: "The end date cannot be before the start date." }]);
      }
      const update: Record<string, unknown> = {};
      if (patch.name !== undefined) update.name = patch.name;
      if (patch.startsOn !== undefined) update.starts_on = patch.startsOn;
      if (patch.endsOn !== undefined) update.ends_on = patch.endsOn;
      if (Object.keys(update).length) await trx("cohorts").where({ id, workshop_id: scope.workshopId }).update(update);
      if (patch.builderIds !== undefined) {
        await checkBuilders(trx, scope, patch.builderIds);
        await replaceBuilders(trx, scope, id, patch.builderIds);
      }
      await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "cohort.updated", entityType: "cohort", entityId: id, data: patch });
      return reread(scope, trx, id);
    }),
  );
}

/** Removes a cohort; its commissions stay, without a cohort. */
export async function deleteCohort(scope: WorkshopScope, id: number): Promise<{ id: number; releasedCommissions: number }> {
  requireManage(scope);
  return inTransaction(async (trx) => {
    const row = await getCohortRow(scope, id, trx, true);
    const released = await trx("commissions").where({ workshop_id: scope.workshopId, cohort_id: id }).update({ cohort_id: null });
    await trx("cohorts").where({ id, workshop_id: scope.workshopId }).delete();
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "cohort.deleted", entityType: "cohort", entityId: id, data: { name: row.name, releasedCommissions: released } });
    return { id, releasedCommissions: Number(released) };
  });
}

/** Open commissions outside this cohort that the owner could put into it (newest first). */
export async function listAssignableCommissions(scope: WorkshopScope, cohortId: number, limit = 300): Promise<Array<{ id: number; number: string; title: string; cohortName: string | null }>> {
  await getCohortRow(scope, cohortId);
  const rows = await visibleCommissions(scope)
    .leftJoin("cohorts as co", (j) => j.on("co.id", "c.cohort_id").andOn("co.workshop_id", "c.workshop_id"))
    .whereNotIn("c.stage", [DELIVERED, CANCELLED])
    .where((q) => q.whereNull("c.cohort_id").orWhereNot("c.cohort_id", cohortId))
    .orderBy("c.id", "desc")
    .limit(limit)
    .select("c.id", "c.number", "c.title", "co.name as cohort_name");
  return rows.map((r: { id: number; number: string; title: string; cohort_name: string | null }) => ({ id: r.id, number: r.number, title: r.title, cohortName: r.cohort_name }));
}
