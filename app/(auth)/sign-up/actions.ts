"use server";

import { signUp } from "@/lib/accounts/accounts";
import { publicAction } from "@/lib/auth/actions";
import { signIn } from "@/lib/auth/auth";
import { callbackPathSchema, signUpSchema } from "@/lib/schemas/auth";

/** Creates the account and signs it in; a new person without a workshop goes on to create one. */
export const signUpAction = publicAction(signUpSchema.extend({ callbackUrl: callbackPathSchema }), async (input) => {
  await signUp(input);
  await signIn("credentials", { email: input.email, password: input.password, redirect: false });
  return { redirectTo: input.callbackUrl === "/workshops" ? "/workshops/new" : input.callbackUrl };
});
