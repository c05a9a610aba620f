// Password reset requests: the e-mail is queued in the transaction that records the request.
import { db } from "@/db/knex";
import { AppError } from "@/lib/http/errors";
import { enqueueEmail } from "@/lib/outbox/enqueue";
import { deleteSignInFailuresForAccount } from "./sign-in-failures";
import { inTransaction } from "./transaction";
import { setUserPassword } from "./users";

/** Records a reset for the account with this address, if there is one; silent otherwise. */
export async function createPasswordReset(email: string, input: { tokenHash: string; expiresAt: Date; resetUrl: string }): Promise<void> {
  await inTransaction(async (trx) => {
    const user = await trx("users").where({ email }).first("id", "name", "email");
    if (!user) return;
    await trx("password_resets").insert({ user_id: user.id, token_hash: input.tokenHash, expires_at: input.expiresAt });
    await enqueueEmail(trx, {
      workshopId: null,
      to: user.email,
      template: "password-reset",
      props: { resetUrl: input.resetUrl, expiresAt: input.expiresAt.toISOString(), name: user.name },
    });
  });
}

export async function isPasswordResetUsable(tokenHash: string): Promise<boolean> {
  const row = await db("password_resets").where({ token_hash: tokenHash }).whereNull("used_at").where("expires_at", ">", new Date()).first("id");
  return !!row;
}

/**
 * Sets the new password if the token is unused and unexpired; every other open reset of the
 * account is used up too, and every existing session ends. Returns the account's address.
 */
export async function consumePasswordReset(tokenHash: string, passwordHash: string): Promise<{ email: string }> {
  const email = await inTransaction(async (trx) => {
    const reset = await trx("password_resets").where({ token_hash: tokenHash }).forUpdate().first("id", "user_id", "expires_at", "used_at");
    if (!reset || reset.used_at || new Date(reset.expires_at).getTime() <= Date.now()) {
      throw new AppError("conflict", "This reset link has expired or was already used. Ask for a new one.", [
        { path: "token", message: "Expired or already used." },
      ]);
    }
    await setUserPassword(reset.user_id, passwordHash, trx);
    await trx("password_resets").where({ user_id: reset.user_id }).whereNull("used_at").update({ used_at: new Date() });
    const user = await trx("users").where({ id: reset.user_id }).first("email");
    return user.email as string;
  });
  await deleteSignInFailuresForAccount(email);
  return { email };
}
