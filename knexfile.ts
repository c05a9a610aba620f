import type { Knex } from "knex";
import { connectionConfig, type DbEnvironment } from "./db/config";
import { migrationSource, seedSource } from "./db/sources";
import { loadEnv } from "./scripts/env.mjs";

// For the CLI (db/cli.ts) and tests: settings from .env.example / .env / the environment.
loadEnv();

function withFiles(env: DbEnvironment): Knex.Config {
  // Files in db/migrations and db/seeds, loaded by db/sources.ts (see there why).
  return { ...connectionConfig(env), migrations: { migrationSource, tableName: "knex_migrations" }, seeds: { seedSource } };
}

const config: Record<DbEnvironment, Knex.Config> = {
  development: withFiles("development"),
  test: withFiles("test"),
  production: withFiles("production"),
};

export default config;
