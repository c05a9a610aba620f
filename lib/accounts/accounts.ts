// Account changes that are not sign-in itself: sign-up, password reset and change, name change.
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { appLink } from "@/lib/auth/links";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { consumePasswordReset, createPasswordReset, isPasswordResetUsable } from "@/lib/data/password-resets";
import { createUser, findUserForPasswordCheck, setUserPassword, updateUserName } from "@/lib/data/users";
import { AppError } from "@/lib/http/errors";

/** A reset link works for one hour, once. */
export const PASSWORD_RESET_TTL_MS = 60 * 60 * 1000;

export async function signUp(input: { name: string; email: string; password: string }): Promise<{ id: number }> {
  const id = await createUser({ email: input.email, name: input.name, passwordHash: await hashPassword(input.password) });
  return { id };
}

export async function requestPasswordReset(email: string): Promise<void> {
  const { token, hash } = newToken();
  await createPasswordReset(email, { tokenHash: hash, expiresAt: new Date(Date.now() + PASSWORD_RESET_TTL_MS), resetUrl: appLink(`/reset/${token}`) });
}

export function passwordResetUsable(token: string): Promise<boolean> {
  return isPasswordResetUsable(hashToken(token));
}

export async function resetPassword(token: string, password: string): Promise<{ email: string }> {
  return consumePasswordReset(hashToken(token), await hashPassword(password));
}

/** Changes (or, for a link-only account, sets) the password; the current one is required if there is one. */
export async function changePassword(user: { id: number; email: string }, input: { current: string; password: string }): Promise<void> {
  const record = await findUserForPasswordCheck(user.email);
  if (record?.passwordHash && !(await verifyPassword(record.passwordHash, input.current))) {
    throw new AppError("validation_failed", "The current password is not right.", [{ path: "current", message: "This is not your current password." }]);
  }
  await setUserPassword(user.id, await hashPassword(input.password));
}

export async function renameAccount(userId: number, name: string): Promise<void> {
  await updateUserName(userId, name);
}
