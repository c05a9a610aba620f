import knexFactory, { type Knex } from "knex";
import { connectionConfig, dbEnvironment } from "./config";

const globalForDb = globalThis as unknown as { scalewrightDb?: Knex };

/**
 * The one Knex instance of this process. Only modules under lib/data and db/ may import it
 * (tests/unit/architecture.test.ts checks that).
 */
export const db: Knex = globalForDb.scalewrightDb ?? knexFactory(connectionConfig(dbEnvironment()));
if (process.env.NODE_ENV !== "production") globalForDb.scalewrightDb = db;
