import type { Knex } from "knex";

// Connection settings from the environment. The app gets its environment from the launcher;
// scripts and tests load .env.example/.env first (knexfile.ts, tests/setup/guard.ts).

export type DbEnvironment = "development" | "test" | "production";

function connection(database: string): Knex.MySql2ConnectionConfig {
  return {
    host: process.env.DB_HOST ?? "127.0.0.1",
    port: Number(process.env.DB_PORT ?? 3407),
    user: process.env.DB_USER ?? "scalewright",
    password: process.env.DB_PASSWORD ?? "",
    database,
    charset: "utf8mb4",
    // Every timestamp is stored and read as UTC.
    timezone: "Z",
    supportBigNumbers: true,
    bigNumberStrings: false,
    connectTimeout: 3000,
  };
}

/** Knex settings for one environment, without migrations or seeds (those live in knexfile.ts). */
export function connectionConfig(env: DbEnvironment): Knex.Config {
  const database = env === "test" ? (process.env.DB_TEST_NAME ?? "scalewright_test") : (process.env.DB_NAME ?? "scalewright");
  return {
    client: "mysql2",
    connection: connection(database),
    pool: {
      min: 0,
      max: Number(process.env.DB_POOL_MAX ?? 20),
      // Sessions run in UTC so NOW() and CURRENT_TIMESTAMP agree with the app.
      afterCreate(
        conn: { query: (sql: string, cb: (err: Error | null) => void) => void },
        done: (err: Error | null, conn: unknown) => void,
      ) {
        conn.query("SET time_zone = '+00:00'", (err) => done(err, conn));
      },
    },
    // Fail fast when the server is away: requests answer 503 instead of hanging.
    acquireConnectionTimeout: 3000,
  };
}

/** Which environment this process uses: KNEX_ENV, else "test" under Vitest, else development. */
export function dbEnvironment(): DbEnvironment {
  const wanted = process.env.KNEX_ENV ?? (process.env.NODE_ENV === "test" ? "test" : "development");
  return wanted === "test" || wanted === "production" ? wanted : "development";
}
