"use server";

import { publicAction, userAction } from "@/lib/auth/actions";
import { signIn } from "@/lib/auth/auth";
import { mintSignInUrl } from "@/lib/auth/magic-link";
import { acceptInvitationAsUser, acceptInvitationWithNewAccount } from "@/lib/members/invitations";
import { invitationAcceptSchema, invitationSignUpSchema } from "@/lib/schemas/member";

/** The signed-in person accepts an invitation sent to their address. */
export const acceptInvitationAction = userAction(invitationAcceptSchema, async ({ token }, user) => {
  const { slug } = await acceptInvitationAsUser(token, user);
  return { redirectTo: `/${slug}` };
});

/**
 * Someone new accepts: account and membership in one step. The link proved the address, so they
 * are signed in at once — with the password if they chose one, else through a one-time link.
 */
export const acceptWithNewAccountAction = publicAction(invitationSignUpSchema, async (input) => {
  const { slug, email } = await acceptInvitationWithNewAccount(input.token, input);
  if (input.password) {
    await signIn("credentials", { email, password: input.password, redirect: false });
    return { redirectTo: `/${slug}` };
  }
  return { redirectTo: await mintSignInUrl(email, `/${slug}`) };
});
