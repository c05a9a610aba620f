import { db } from "@/db/knex";

/** True when MariaDB answers a trivial query within a second. */
export async function isDatabaseUp(): Promise<boolean> {
  try {
    await Promise.race([
      db.raw("SELECT 1"),
      new Promise((_, reject) => setTimeout(() => reject(new Error("timeout")), 1000)),
    ]);
    return true;
  } catch {
    return false;
  }
}
