// Inviting and accepting: the token and link are made here, the rows in lib/data/invitations.ts.
import { hashPassword } from "@/lib/auth/password";
import type { Role } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { appLink } from "@/lib/auth/links";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { acceptInvitation, acceptInvitationAsNewUser, createInvitation, findInvitationByToken } from "@/lib/data/invitations";
import type { InvitationOut } from "@/lib/schemas/member";

/** An invitation link works for this long, and once. */
export const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;

export async function inviteMember(scope: WorkshopScope, input: { email: string; role: Role }): Promise<InvitationOut> {
  const { token, hash } = newToken();
  return createInvitation(scope, {
    email: input.email,
    role: input.role,
    tokenHash: hash,
    expiresAt: new Date(Date.now() + INVITATION_TTL_MS),
    acceptUrl: appLink(`/invitations/${token}`),
  });
}

export function previewInvitation(token: string) {
  return findInvitationByToken(hashToken(token));
}

export function acceptInvitationAsUser(token: string, user: { id: number; email: string }) {
  return acceptInvitation(hashToken(token), user);
}

/** Creates the account (password optional: without one, the person signs in by e-mailed links). */
export async function acceptInvitationWithNewAccount(token: string, input: { name: string; password?: string }) {
  const passwordHash = input.password ? await hashPassword(input.password) : null;
  return acceptInvitationAsNewUser(hashToken(token), { name: input.name, passwordHash });
}
