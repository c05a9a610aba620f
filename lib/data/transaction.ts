import type { Knex } from "knex";
import { db } from "@/db/knex";

/** A transaction handed from one data function to another (e.g. to enqueue an e-mail with a change). */
export type Trx = Knex.Transaction;

/** InnoDB chose this transaction as a deadlock victim and rolled it back: safe to run again. */
export function isDeadlock(err: unknown): boolean {
  return !!err && typeof err === "object" && (err as { code?: unknown }).code === "ER_LOCK_DEADLOCK";
}

const DEADLOCK_ATTEMPTS = 3;

/**
 * Runs `fn` in one transaction: committed when it resolves, rolled back when it throws. A deadlock
 * victim is retried from the start (InnoDB has already undone all of it, and everything a data
 * function does — e-mails included, through the outbox — is inside the transaction).
 */
export async function inTransaction<T>(fn: (trx: Trx) => Promise<T>): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await db.transaction(fn);
    } catch (err) {
      if (!isDeadlock(err) || attempt >= DEADLOCK_ATTEMPTS) throw err;
      await new Promise((r) => setTimeout(r, 5 + Math.random() * 20 * attempt));
    }
  }
}

/** A mysql2 duplicate-key error (ER_DUP_ENTRY), e.g. a taken slug or e-mail address. */
export function isDuplicateKey(err: unknown): boolean {
  return !!err && typeof err === "object" && (err as { code?: unknown }).code === "ER_DUP_ENTRY";
}

/** A timestamp column as ISO 8601 UTC. */
export function iso(value: Date | string): string {
  return (value instanceof Date ? value : new Date(value)).toISOString();
}
