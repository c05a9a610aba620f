import type { Knex } from "knex";
import { DEMO_COHORT, DEMO_COMMISSIONS } from "../../lib/demo/commissions";
import { computeSpec } from "../../lib/lutherie/compute-spec";
import { presetById } from "../../lib/lutherie/presets";
import { formatCommissionNumber } from "../../lib/workflow/commission-number";

// Demo commissions at various stages (only in a workshop that has none yet, so another demo seed's
// commissions are never doubled) and a course cohort with its builders. Idempotent: the cohort is
// matched by name and commissions are created and put into it only on the first run.

const DAY_MS = 86_400_000;
const daysAgo = (n: number, now: number) => new Date(now - n * DAY_MS);
const dateIn = (n: number, now: number) => new Date(now + n * DAY_MS).toISOString().slice(0, 10);

async function userId(knex: Knex, email: string): Promise<number> {
  const u = await knex("users").where({ email }).first("id");
  if (!u) throw new Error(`demo person ${email} is missing: run the people seed first`);
  return u.id;
}

export async function seed(knex: Knex): Promise<void> {
  const ws = await knex("workshops").where({ slug: DEMO_COHORT.workshop }).first("id", "currency", "deposit_percent");
  if (!ws) return;
  const now = Date.now();
  const existingCohort = await knex("cohorts").where({ workshop_id: ws.id, name: DEMO_COHORT.name }).first("id");
  if (existingCohort) return;

  const [cohortId] = await knex("cohorts").insert({
    workshop_id: ws.id,
    name: DEMO_COHORT.name,
    starts_on: dateIn(-DEMO_COHORT.startsDaysAgo, now),
    ends_on: dateIn(DEMO_COHORT.lengthDays - DEMO_COHORT.startsDaysAgo, now),
  });
  for (const email of DEMO_COHORT.builders) {
    await knex("cohort_builders").insert({ workshop_id: ws.id, cohort_id: cohortId, user_id: await userId(knex, email) });
  }

  const hasCommissions = await knex("commissions").where({ workshop_id: ws.id }).first("id");
  if (hasCommissions) {
    // Another seed made the demo commissions: put the open ones of the cohort's builders in the cohort.
    const builderIds = await Promise.all(DEMO_COHORT.builders.map((e) => userId(knex, e)));
    await knex("commissions").where({ workshop_id: ws.id }).whereIn("builder_user_id", builderIds).whereNotIn("stage", ["delivered", "cancelled"]).update({ cohort_id: cohortId });
    return;
  }

  const year = new Date(now).getUTCFullYear();
  let sequence = 0;
  for (const d of DEMO_COMMISSIONS) {
    sequence += 1;
    const clientId = await userId(knex, d.client);
    const builderId = d.builder ? await userId(knex, d.builder) : null;
    const depositPercent = Number(ws.deposit_percent);
    const depositMinor = Math.round((d.priceMinor * depositPercent) / 100);
    const [stage, enteredDaysAgo] = d.path.at(-1)!;
    const [id] = await knex("commissions").insert({
      workshop_id: ws.id,
      number: formatCommissionNumber(year, sequence),
      client_user_id: clientId,
      builder_user_id: builderId,
      title: d.title,
      price_minor: d.priceMinor,
      deposit_minor: depositMinor,
      deposit_percent: depositPercent,
      currency: ws.currency,
      target_date: d.targetInDays === null ? null : dateIn(d.targetInDays, now),
      stage,
      client_stage: stage,
      stage_entered_at: daysAgo(enteredDaysAgo, now),
      cohort_id: d.inCohort ? cohortId : null,
      created_at: daysAgo(d.path[0]![1], now),
    });
    let from: string | null = null;
    for (const [to, ago] of d.path) {
      await knex("stage_history").insert({
        workshop_id: ws.id,
        commission_id: id,
        from_stage: from,
        to_stage: to,
        kind: from === null ? "open" : "advance",
        actor_user_id: builderId ?? clientId,
        client_notified_at: daysAgo(ago, now),
        created_at: daysAgo(ago, now),
      });
      from = to;
    }
    if (d.path.length > 1) {
      // The client approved spec version 1 when the commission left the spec stage.
      const spec = presetById(d.preset).spec;
      const result = computeSpec(spec);
      const approvedAt = daysAgo(d.path[1]![1], now);
      await knex("spec_versions").insert({
        workshop_id: ws.id,
        commission_id: id,
        version: 1,
        spec: JSON.stringify(spec),
        options: JSON.stringify({}),
        result: JSON.stringify(result),
        has_errors: result.issues.some((i) => i.level === "error"),
        total_tension_n: result.totals.tensionN,
        created_by: builderId ?? clientId,
        created_at: daysAgo(d.path[0]![1], now),
        submitted_at: approvedAt,
        approved_at: approvedAt,
        approved_by: clientId,
      });
    }
    const pay = async (kind: "deposit" | "balance", amount: number, ago: number) =>
      knex("payments").insert({ workshop_id: ws.id, commission_id: id, kind, status: "paid", method: "offline", amount_minor: amount, currency: ws.currency, reference: "Bank transfer (demo)", paid_at: daysAgo(ago, now) });
    if (d.depositPaid && depositMinor > 0) await pay("deposit", depositMinor, d.path[2]?.[1] ?? enteredDaysAgo);
    if (d.balancePaid) await pay("balance", d.priceMinor - depositMinor, enteredDaysAgo);
  }
  await knex("commission_counters").insert({ workshop_id: ws.id, year, last_sequence: sequence }).onConflict(["workshop_id", "year"]).merge({ last_sequence: sequence });
}
