// Auth.js e-mail sign-in tokens (the token column holds Auth.js's hash of the token, never the token).
import { db } from "@/db/knex";
import { inTransaction } from "./transaction";

export async function insertVerificationToken(t: { identifier: string; token: string; expires: Date }): Promise<void> {
  await db("verification_tokens").insert(t);
  // Expired tokens are useless; clear them while we are here.
  await db("verification_tokens").where("expires", "<", new Date(Date.now() - 86_400_000)).delete();
}

/** Returns the token and deletes it in one step, so a link works once even when clicked twice at once. */
export async function consumeVerificationToken(t: { identifier: string; token: string }): Promise<{ identifier: string; token: string; expires: Date } | null> {
  return inTransaction(async (trx) => {
    const row = await trx("verification_tokens").where(t).forUpdate().first("identifier", "token", "expires");
    if (!row) return null;
    await trx("verification_tokens").where(t).delete();
    return { identifier: row.identifier, token: row.token, expires: new Date(row.expires) };
  });
}
