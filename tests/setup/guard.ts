// Refuses to run tests against anything but the local test database.
import { loadEnv } from "../../scripts/env.mjs";

loadEnv();
process.env.KNEX_ENV = "test";

const host = process.env.DB_HOST ?? "";
const name = process.env.DB_TEST_NAME ?? "";
if (!["127.0.0.1", "localhost"].includes(host)) throw new Error(`tests refuse to run against DB_HOST=${host}`);
if (!/test/.test(name)) throw new Error(`tests refuse to run against a database not named *test*: ${name}`);
