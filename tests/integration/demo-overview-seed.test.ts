// The demo seed gives Fernhollow's owner something to oversee: commissions at several stages for
// both builders, each one's stage history ending where it stands, an overdue build, a deposit
// asked for and unpaid, and a course cohort with its builders. The overview's rules are the
// product's own (no outside source).
import type { Knex } from "knex";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_COHORT } from "../../lib/demo/overview";
import { createScratchDatabase } from "../setup/db";

let knex: Knex;
let drop: () => Promise<void>;
let workshopId: number;

beforeAll(async () => {
  ({ knex, drop } = await createScratchDatabase("demo_overview"));
  await knex.migrate.latest();
  await knex.seed.run();
  workshopId = (await knex("workshops").where({ slug: "fernhollow" }).first("id")).id;
});
afterAll(async () => drop());

describe("demo overview data", () => {
  it("has a cohort with both builders and most of the commissions", async () => {
    const cohort = await knex("cohorts").where({ workshop_id: workshopId, name: DEMO_COHORT.name }).first();
    const builders = await knex("cohort_builders as cb").join("users as u", "u.id", "cb.user_id").where("cb.cohort_id", cohort.id).pluck("u.email");
    expect(builders.sort()).toEqual([...DEMO_COHORT.builders].sort());
    const inCohort = await knex("commissions").where({ workshop_id: workshopId, cohort_id: cohort.id }).pluck("stage");
    expect(inCohort).toContain("delivered");
    expect(inCohort.length).toBeGreaterThanOrEqual(3);
  });

  it("ends every commission's history in the stage it is in, entered at that moment", async () => {
    const rows = await knex("commissions").where({ workshop_id: workshopId }).select("id", "stage", "stage_entered_at");
    expect(rows.length).toBeGreaterThanOrEqual(5);
    for (const c of rows) {
      const last = await knex("stage_history").where({ commission_id: c.id }).orderBy("created_at", "desc").first("to_stage", "created_at");
      expect(last.to_stage, `commission ${c.id}`).toBe(c.stage);
      expect(new Date(last.created_at).getTime()).toBe(new Date(c.stage_entered_at).getTime());
    }
  });

  it("has an overdue build, an unpaid deposit in the deposit stage and an approved, error-free spec past the spec stage", async () => {
    const today = new Date().toISOString().slice(0, 10);
    const overdue = await knex("commissions").where({ workshop_id: workshopId }).where("target_date", "<", today).whereNotIn("stage", ["delivered", "cancelled"]).first("id");
    expect(overdue).toBeTruthy();
    const waiting = await knex("commissions as c")
      .leftJoin("payments as p", "p.commission_id", "c.id")
      .where({ "c.workshop_id": workshopId, "c.stage": "deposit" })
      .whereNull("p.id")
      .first("c.id");
    expect(waiting).toBeTruthy();
    const past = await knex("commissions as c")
      .leftJoin("spec_versions as v", (j) => j.on("v.commission_id", "c.id").andOnNotNull("v.approved_at"))
      .where("c.workshop_id", workshopId)
      .whereNot("c.stage", "spec")
      // A request withdrawn (cancelled) in the spec stage never had an approved spec.
      .whereNotExists((q) => q.select(knex.raw("1")).from("stage_history as h").whereRaw("h.commission_id = c.id").where({ "h.from_stage": "spec", "h.to_stage": "cancelled" }))
      .select("c.id", "v.has_errors", "v.id as version_id");
    for (const r of past) {
      expect(r.version_id, `commission ${r.id}`).not.toBeNull();
      expect(!!r.has_errors).toBe(false);
    }
  });
});
