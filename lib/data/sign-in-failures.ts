import { db } from "@/db/knex";

/** Times of the most recent failures since `since`, newest first, for one account or one IP. */
export async function recentSignInFailures(by: { accountKey: string } | { ip: string }, since: Date, limit: number): Promise<Date[]> {
  const q = db("sign_in_failures").where("created_at", ">", since).orderBy("created_at", "desc").limit(limit);
  if ("accountKey" in by) q.where("account_key", by.accountKey);
  else q.where("ip", by.ip);
  return (await q.pluck("created_at")) as Date[];
}

export async function insertSignInFailure(accountKey: string, ip: string, at: Date = new Date()): Promise<void> {
  await db("sign_in_failures").insert({ account_key: accountKey, ip, created_at: at });
}

/** Forgets an account's failures (after a successful sign-in or a password reset). */
export async function deleteSignInFailuresForAccount(accountKey: string): Promise<void> {
  await db("sign_in_failures").where("account_key", accountKey).delete();
}

export async function pruneSignInFailures(before: Date): Promise<void> {
  await db("sign_in_failures").where("created_at", "<", before).delete();
}
