"use server";

import { revalidatePath } from "next/cache";
import { changePassword, renameAccount } from "@/lib/accounts/accounts";
import { userAction } from "@/lib/auth/actions";
import { signIn } from "@/lib/auth/auth";
import { accountNameSchema, changePasswordSchema } from "@/lib/schemas/auth";

export const renameAction = userAction(accountNameSchema, async ({ name }, user) => {
  await renameAccount(user.id, name);
  revalidatePath("/", "layout");
  return { name };
});

/** Changes the password, which ends every other session; this one is renewed at once. */
export const changePasswordAction = userAction(changePasswordSchema, async (input, user) => {
  await changePassword(user, input);
  await signIn("credentials", { email: user.email, password: input.password, redirect: false });
  return { changed: true };
});
