import type { Knex } from "knex";

// Indexes for the commission list's main filters and sorts (GET …/commissions, checked with EXPLAIN
// in tests/http/commissions-list-large.test.ts):
//   a builder's own list, newest first        (workshop_id, builder_user_id, updated_at)
//   a builder's list filtered by stage        (workshop_id, builder_user_id, stage, updated_at), replacing the 3-column one
//   overdue: counted from the index alone     (workshop_id, target_date, stage)
//   title sort and search, counted from the index alone: (workshop_id, title, number), replacing (workshop_id, title);
//   the title sort breaks ties by the number, unique within a workshop.
// One ALTER each way, so the table is altered once.

export async function up(knex: Knex): Promise<void> {
  await knex.raw(`ALTER TABLE commissions
    ADD INDEX commissions_builder_updated_index (workshop_id, builder_user_id, updated_at),
    ADD INDEX commissions_builder_stage_updated_index (workshop_id, builder_user_id, stage, updated_at),
    ADD INDEX commissions_target_date_stage_index (workshop_id, target_date, stage),
    ADD INDEX commissions_title_number_index (workshop_id, title, number),
    DROP INDEX commissions_workshop_id_builder_user_id_stage_index,
    DROP INDEX commissions_workshop_id_title_index`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`ALTER TABLE commissions
    ADD INDEX commissions_workshop_id_builder_user_id_stage_index (workshop_id, builder_user_id, stage),
    ADD INDEX commissions_workshop_id_title_index (workshop_id, title),
    DROP INDEX commissions_builder_updated_index,
    DROP INDEX commissions_builder_stage_updated_index,
    DROP INDEX commissions_target_date_stage_index,
    DROP INDEX commissions_title_number_index`);
}
