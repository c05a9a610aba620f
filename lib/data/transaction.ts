import type { Knex } from "knex";
import { db } from "@/db/knex";

/** A transaction handed from one data function to another (e.g. to enqueue an e-mail with a change). */
export type Trx = Knex.Transaction;

/** Runs `fn` in one transaction: committed when it resolves, rolled back when it throws. */
export function inTransaction<T>(fn: (trx: Trx) => Promise<T>): Promise<T> {
  return db.transaction(fn);
}

/** A mysql2 duplicate-key error (ER_DUP_ENTRY), e.g. a taken slug or e-mail address. */
export function isDuplicateKey(err: unknown): boolean {
  return !!err && typeof err === "object" && (err as { code?: unknown }).code === "ER_DUP_ENTRY";
}

/** A timestamp column as ISO 8601 UTC. */
export function iso(value: Date | string): string {
  return (value instanceof Date ? value : new Date(value)).toISOString();
}
