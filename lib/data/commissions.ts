// Commissions: list, read, open, change. Every query starts from visibleCommissions(scope).
import type { Knex } from "knex";
import { db } from "@/db/knex";
import type { WorkshopScope } from "@/lib/auth/scope";
import { AppError, forbidden } from "@/lib/http/errors";
import { money, percentOf } from "@/lib/money/money";
import type { CommissionCreate, CommissionListQuery, CommissionPatch } from "@/lib/schemas/commission";
import type { CommissionPage, CommissionSummary } from "@/lib/schemas/commission-out";
import { CANCELLED, DELIVERED, ON_HOLD, SPEC, stageLabel, stageLine, type BuildStage } from "@/lib/workflow/stages";
import { writeAudit } from "./audit";
import { checkCohortOfWorkshop } from "./cohorts";
import { getVisibleCommissionRow, visibleCommissions, type CommissionRow } from "./commission-access";
import { nextCommissionNumber } from "./commission-numbers";
import { inTransaction, iso, type Trx } from "./transaction";
import { buildStagesColumn, buildStagesFrom, getWorkshopSettings } from "./workshop-settings";

type Row = CommissionRow & { client_name: string; builder_name: string | null };

const SELECT = ["c.*", "cu.name as client_name", "bu.name as builder_name"];

function withPeople(q: Knex.QueryBuilder) {
  return q.join("users as cu", "cu.id", "c.client_user_id").leftJoin("users as bu", "bu.id", "c.builder_user_id");
}

const dateOnly = (d: Date | string | null): string | null => (d === null ? null : typeof d === "string" ? d.slice(0, 10) : d.toISOString().slice(0, 10));

const todayUtc = () => new Date().toISOString().slice(0, 10);

/** The one mapping from a row to what a caller with this scope may see. */
export function toSummary(scope: WorkshopScope, r: Row, template: readonly BuildStage[]): CommissionSummary {
  const stage = scope.role === "client" ? r.client_stage : r.stage;
  const target = dateOnly(r.target_date);
  return {
    id: r.id,
    number: r.number,
    title: r.title,
    stage,
    stageLabel: stageLabel(stage, template),
    heldFrom: r.held_from,
    stageEnteredAt: iso(r.stage_entered_at),
    awaitingSignoff: scope.role !== "client" && r.stage !== r.client_stage,
    client: { id: r.client_user_id, name: r.client_name },
    builder: r.builder_user_id ? { id: r.builder_user_id, name: r.builder_name ?? "" } : null,
    money:
      scope.role === "builder"
        ? null
        : { currency: r.currency, priceMinor: Number(r.price_minor), depositMinor: Number(r.deposit_minor), depositPercent: Number(r.deposit_percent) },
    targetDate: target,
    overdue: target !== null && target < todayUtc() && r.stage !== DELIVERED && r.stage !== CANCELLED,
    createdAt: iso(r.created_at),
    updatedAt: iso(r.updated_at),
  };
}

const SORT_COLUMNS = {
  number: "c.number",
  title: "c.title",
  targetDate: "c.target_date",
  updated: "c.updated_at",
} as const;

/** The order the stage sort follows: the workshop's own line, then the side states. */
export function stageSortLine(template: readonly BuildStage[]): string[] {
  return [...stageLine(template), ON_HOLD, CANCELLED];
}

/**
 * The list's SQL on a base already narrowed to what the caller may see (`visibleCommissions`):
 * the filters, then the count and one sorted page. The benchmark's floor route runs exactly these.
 * `line` is only read by the stage sort. The count also reads the workshop's stage template
 * (`build_stages`), which the stage labels need, so that takes no statement of its own.
 *
 * The page is found on the commissions table alone (`p`: ids in order, from an index that matches
 * the sort) and only its rows are then joined to their people: joined from the start, the optimizer
 * may drive the query from the small users table and sort every commission of the workshop.
 */
export function commissionListQueries(
  knex: Knex | Trx,
  base: Knex.QueryBuilder,
  query: CommissionListQuery,
  opts: { workshopId: number; stageColumn: "c.stage" | "c.client_stage"; line: readonly string[] },
) {
  if (query.stage) base.whereIn(opts.stageColumn, query.stage.split(",").filter(Boolean));
  if (query.builder === "none") base.whereNull("c.builder_user_id");
  else if (query.builder !== undefined) base.where("c.builder_user_id", query.builder);
  if (query.client !== undefined) base.where("c.client_user_id", query.client);
  if (query.cohort !== undefined) base.where("c.cohort_id", query.cohort);
  if (query.overdue !== undefined) {
    const today = todayUtc();
    const overdue = (q: Knex.QueryBuilder) => q.whereNotNull("c.target_date").where("c.target_date", "<", today).whereNotIn("c.stage", [DELIVERED, CANCELLED]);
    if (query.overdue) overdue(base);
    else base.whereNot((q) => void overdue(q));
  }
  if (query.q) {
    const like = `%${query.q.replace(/[\\%_]/g, (m) => `\\${m}`)}%`;
    base.where((q) => q.where("c.title", "like", like).orWhere("c.number", "like", like));
  }

  const count = base.clone().count({ n: "*" }).select(buildStagesColumn(knex, opts.workshopId)).first();
  const desc = query.sort.startsWith("-");
  const key = query.sort.replace(/^-/, "") as keyof typeof SORT_COLUMNS | "stage";
  const dir = desc ? "desc" : "asc";
  // Ties are broken by a unique key the sort's index already holds: the number for the title sort
  // (numbers are unique within a workshop, and need no tie-breaker of their own), else the id.
  const order = (q: Knex.QueryBuilder) => {
    if (key === "stage") q.orderByRaw(desc ? "FIND_IN_SET(??, ?) DESC" : "FIND_IN_SET(??, ?) ASC", [opts.stageColumn, opts.line.join(",")]);
    else q.orderBy(SORT_COLUMNS[key], dir);
    if (key === "title") q.orderBy("c.number", dir);
    else if (key !== "number") q.orderBy("c.id", dir);
    return q;
  };
  const page = order(base.clone().select("c.id")).limit(query.pageSize).offset((query.page - 1) * query.pageSize);
  const rows = order(withPeople(knex.from(page.as("p")).join("commissions as c", "c.id", "p.id")).select(SELECT));
  return { count, rows };
}

/** A page of the commissions the caller may see, filtered, searched and sorted. */
export async function listCommissions(scope: WorkshopScope, query: CommissionListQuery): Promise<CommissionPage> {
  const stageColumn = scope.role === "client" ? "c.client_stage" : "c.stage";
  // The stage sort follows the workshop's own line, so it reads the settings first; every other
  // sort runs the count (which brings the template for the labels) and the page side by side.
  const line = query.sort.endsWith("stage") ? stageSortLine((await getWorkshopSettings(scope)).buildStages) : [];
  const { count, rows } = commissionListQueries(db, visibleCommissions(scope), query, { workshopId: scope.workshopId, stageColumn, line });
  const [counted, list] = (await Promise.all([count, rows])) as [{ n: number; build_stages: unknown } | undefined, Row[]];
  const template = buildStagesFrom(counted?.build_stages ?? null);
  return { items: list.map((r) => toSummary(scope, r, template)), total: Number(counted?.n ?? 0), page: query.page, pageSize: query.pageSize };
}

/** One commission as the caller may see it (404 otherwise). */
export async function getCommissionSummary(scope: WorkshopScope, id: number, trx?: Trx): Promise<CommissionSummary> {
  await getVisibleCommissionRow(scope, id, { trx });
  const row = (await withPeople(visibleCommissions(scope, trx)).where("c.id", id).first(SELECT)) as Row;
  const settings = await getWorkshopSettings(scope, trx);
  return toSummary(scope, row, settings.buildStages);
}

async function memberRole(trx: Trx, scope: WorkshopScope, userId: number): Promise<string | null> {
  const m = await trx("memberships").where({ workshop_id: scope.workshopId, user_id: userId }).first("role");
  return m?.role ?? null;
}

/** A builder assignment must name a builder (or the owner) of this workshop. */
async function checkBuilder(trx: Trx, scope: WorkshopScope, builderId: number | null | undefined) {
  if (builderId === null || builderId === undefined) return;
  const role = await memberRole(trx, scope, builderId);
  if (role !== "builder" && role !== "owner") {
    throw new AppError("validation_failed", "Choose a builder of this workshop.", [{ path: "builderId", message: "Not a builder of this workshop." }]);
  }
}

/**
 * Opens a commission in the spec stage. A client opens a request for themselves; the owner or a
 * builder opens one for a client of the workshop.
 */
export async function createCommission(scope: WorkshopScope, input: CommissionCreate): Promise<CommissionSummary> {
  return inTransaction(async (trx) => {
    const settings = await getWorkshopSettings(scope, trx);
    let clientId: number;
    if (scope.role === "client") {
      clientId = scope.userId;
    } else {
      if (!input.clientId) throw new AppError("validation_failed", "Choose the client.", [{ path: "clientId", message: "Required" }]);
      if ((await memberRole(trx, scope, input.clientId)) !== "client") {
        throw new AppError("validation_failed", "Choose a client of this workshop.", [{ path: "clientId", message: "Not a client of this workshop." }]);
      }
      clientId = input.clientId;
    }
    const builderId = scope.role === "builder" ? scope.userId : scope.role === "owner" ? (input.builderId ?? null) : null;
    await checkBuilder(trx, scope, builderId);
    // What a client asks for is a request: the workshop sets price and deposit.
    const priceMinor = scope.role === "owner" ? input.priceMinor : 0;
    const currency = scope.role === "owner" ? (input.currency ?? settings.currency) : settings.currency;
    const depositPercent = scope.role === "owner" ? (input.depositPercent ?? settings.depositPercent) : settings.depositPercent;
    const depositMinor = percentOf(money(priceMinor, currency), depositPercent).amountMinor;
    const number = await nextCommissionNumber(trx, scope.workshopId, new Date().getUTCFullYear());
    const [id] = await trx("commissions").insert({
      workshop_id: scope.workshopId,
      number,
      client_user_id: clientId,
      builder_user_id: builderId,
      title: input.title,
      price_minor: priceMinor,
      deposit_minor: depositMinor,
      deposit_percent: depositPercent,
      currency,
      target_date: scope.role === "client" ? null : (input.targetDate ?? null),
      stage: SPEC,
      client_stage: SPEC,
      request_notes: input.requestNotes || null,
    });
    const commissionId = Number(id);
    await trx("stage_history").insert({
      workshop_id: scope.workshopId,
      commission_id: commissionId,
      from_stage: null,
      to_stage: SPEC,
      kind: "open",
      actor_user_id: scope.userId,
      client_notified_at: trx.fn.now(3),
    });
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "commission.opened", entityType: "commission", entityId: commissionId, data: { number } });
    return getCommissionSummary(scope, commissionId, trx);
  });
}

/** Changes a commission's fields; money is the owner's, and the deposit only before approval. */
export async function updateCommission(scope: WorkshopScope, id: number, patch: CommissionPatch): Promise<CommissionSummary> {
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, id, { trx, forUpdate: true });
    if (row.stage === DELIVERED || row.stage === CANCELLED) throw new AppError("conflict", "A delivered or cancelled commission cannot be changed.");
    const moneyFields = ["priceMinor", "depositPercent", "depositMinor", "builderId"] as const;
    if (scope.role !== "owner" && moneyFields.some((f) => patch[f] !== undefined)) {
      throw forbidden("Only the owner can change the price, the deposit or the builder.");
    }
    const update: Record<string, unknown> = {};
    if (patch.title !== undefined) update.title = patch.title;
    if (patch.targetDate !== undefined) update.target_date = patch.targetDate;
    if (patch.builderId !== undefined) {
      await checkBuilder(trx, scope, patch.builderId);
      update.builder_user_id = patch.builderId;
    }
    if (patch.cohortId !== undefined) {
      if (scope.role !== "owner") throw forbidden("Only the owner can change the cohort.");
      await checkCohortOfWorkshop(trx, scope, patch.cohortId);
      update.cohort_id = patch.cohortId;
    }
    const touchesDeposit = patch.priceMinor !== undefined || patch.depositPercent !== undefined || patch.depositMinor !== undefined;
    if (touchesDeposit) {
      const approved = await trx("spec_versions").where({ workshop_id: scope.workshopId, commission_id: id }).whereNotNull("approved_at").first("id");
      if (approved || row.stage !== SPEC) {
        throw new AppError("conflict", "The price and deposit are fixed once the client has approved a spec; record a change in a comment instead.");
      }
      const price = patch.priceMinor ?? Number(row.price_minor);
      const percent = patch.depositPercent ?? Number(row.deposit_percent);
      const deposit = patch.depositMinor ?? percentOf(money(price, row.currency), percent).amountMinor;
      if (deposit > price) throw new AppError("validation_failed", "The deposit cannot be more than the price.", [{ path: "depositMinor", message: "More than the price." }]);
      Object.assign(update, { price_minor: price, deposit_percent: percent, deposit_minor: deposit });
    }
    await trx("commissions").where({ id, workshop_id: scope.workshopId }).update(update);
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "commission.updated", entityType: "commission", entityId: id, data: patch });
    return getCommissionSummary(scope, id, trx);
  });
}

/** The people a commission form can choose from: the workshop's clients and builders. */
export async function listCommissionPeople(scope: WorkshopScope): Promise<{ clients: Array<{ id: number; name: string }>; builders: Array<{ id: number; name: string }> }> {
  const rows = await db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .where("m.workshop_id", scope.workshopId)
    .whereIn("m.role", ["client", "builder", "owner"])
    .orderBy("u.name")
    .select("u.id", "u.name", "m.role");
  return {
    clients: rows.filter((r: { role: string }) => r.role === "client").map((r: { id: number; name: string }) => ({ id: r.id, name: r.name })),
    builders: rows.filter((r: { role: string }) => r.role !== "client").map((r: { id: number; name: string }) => ({ id: r.id, name: r.name })),
  };
}
