import type { Knex } from "knex";
import { DEMO_COHORT } from "../../lib/demo/overview";

// The course cohort of Fernhollow's demo: its dates, its two builders, and their commissions
// (delivered and in progress; not cancelled ones) from the commissions seed. Idempotent: the cohort
// is matched by name and filled only on the first run.

const DAY_MS = 86_400_000;
const dateIn = (n: number, now: number) => new Date(now + n * DAY_MS).toISOString().slice(0, 10);

export async function seed(knex: Knex): Promise<void> {
  const ws = await knex("workshops").where({ slug: DEMO_COHORT.workshop }).first("id");
  if (!ws) return;
  if (await knex("cohorts").where({ workshop_id: ws.id, name: DEMO_COHORT.name }).first("id")) return;
  const now = Date.now();
  const builderIds = (await knex("users").whereIn("email", DEMO_COHORT.builders).pluck("id")) as number[];
  if (builderIds.length !== DEMO_COHORT.builders.length) throw new Error("the cohort's demo builders are missing: run the people seed first");
  await knex.transaction(async (trx) => {
    const [cohortId] = await trx("cohorts").insert({
      workshop_id: ws.id,
      name: DEMO_COHORT.name,
      starts_on: dateIn(-DEMO_COHORT.startsDaysAgo, now),
      ends_on: dateIn(DEMO_COHORT.lengthDays - DEMO_COHORT.startsDaysAgo, now),
    });
    for (const userId of builderIds) await trx("cohort_builders").insert({ workshop_id: ws.id, cohort_id: cohortId, user_id: userId });
    await trx("commissions").where({ workshop_id: ws.id }).whereIn("builder_user_id", builderIds).whereNot("stage", "cancelled")
      // Keep each commission's own last-changed time: joining a cohort is not a change the list should show.
      .update({ cohort_id: cohortId, updated_at: trx.raw("??", ["updated_at"]) });
  });
}
