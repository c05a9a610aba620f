"use server";

import { requestPasswordReset, resetPassword } from "@/lib/accounts/accounts";
import { publicAction } from "@/lib/auth/actions";
import { signIn } from "@/lib/auth/auth";
import { resetPasswordSchema, resetRequestSchema } from "@/lib/schemas/auth";

/** Always answers the same, so the form does not reveal which addresses have accounts. */
export const requestResetAction = publicAction(resetRequestSchema, async ({ email }) => {
  await requestPasswordReset(email);
  return { email };
});

/** Sets the new password (ending every session) and signs this browser in with it. */
export const resetPasswordAction = publicAction(resetPasswordSchema, async ({ token, password }) => {
  const { email } = await resetPassword(token, password);
  await signIn("credentials", { email, password, redirect: false });
  return { redirectTo: "/workshops" };
});
