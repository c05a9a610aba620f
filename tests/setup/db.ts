import knexFactory, { type Knex } from "knex";
import config from "../../knexfile";

/**
 * A connection to a throwaway database of its own (scalewright_test_<suffix>), created empty,
 * for tests that migrate up and down or seed without disturbing the shared test database.
 */
export async function createScratchDatabase(suffix: string): Promise<{ knex: Knex; drop: () => Promise<void> }> {
  const base = config.test;
  const conn = base.connection as Knex.MySql2ConnectionConfig;
  const name = `${conn.database}_${suffix}`;
  const admin = knexFactory({ ...base, connection: { ...conn, database: undefined } });
  await admin.raw("DROP DATABASE IF EXISTS ??", [name]);
  await admin.raw("CREATE DATABASE ?? CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci", [name]);
  const knex = knexFactory({ ...base, connection: { ...conn, database: name } });
  return {
    knex,
    drop: async () => {
      await knex.destroy();
      await admin.raw("DROP DATABASE IF EXISTS ??", [name]);
      await admin.destroy();
    },
  };
}
