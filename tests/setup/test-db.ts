// A Knex connection to the test database for fixtures and checks (tests may query it directly;
// the app's code still goes through lib/data).
import knexFactory, { type Knex } from "knex";
import config from "../../knexfile";

let instance: Knex | undefined;

export function testDb(): Knex {
  instance ??= knexFactory({ ...config.test, pool: { min: 0, max: 4 } });
  return instance;
}

export async function closeTestDb(): Promise<void> {
  await instance?.destroy();
  instance = undefined;
}
