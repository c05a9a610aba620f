import { db } from "@/db/knex";

/** Closes this process's connection pool (workers and scripts, on shutdown). */
export async function closeDatabase(): Promise<void> {
  await db.destroy();
}
