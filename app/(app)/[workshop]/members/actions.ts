"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { workshopAction } from "@/lib/auth/actions";
import { revokeInvitation } from "@/lib/data/invitations";
import { changeMemberRole, removeMember } from "@/lib/data/memberships";
import { retryFailedMessage } from "@/lib/data/outbox";
import { inviteMember } from "@/lib/members/invitations";
import { idParamSchema, invitationCreateSchema, roleSchema } from "@/lib/schemas/member";

// Each action authorises itself through workshopAction: the slug comes from the page's URL, the
// workshop id from the caller's membership.
const refresh = (slug: string) => revalidatePath(`/${slug}/members`);

export const inviteMemberAction = workshopAction({ permission: "member.manage", schema: invitationCreateSchema }, async (input, ctx) => {
  const invitation = await inviteMember(ctx.scope, input);
  refresh(ctx.workshop.slug);
  return invitation;
});

export const changeRoleAction = workshopAction(
  { permission: "member.manage", schema: z.object({ memberId: idParamSchema, role: roleSchema }) },
  async ({ memberId, role }, ctx) => {
    const member = await changeMemberRole(ctx.scope, memberId, role);
    refresh(ctx.workshop.slug);
    return member;
  },
);

export const removeMemberAction = workshopAction({ permission: "member.manage", schema: z.object({ memberId: idParamSchema }) }, async ({ memberId }, ctx) => {
  await removeMember(ctx.scope, memberId);
  refresh(ctx.workshop.slug);
  return { removed: memberId };
});

export const revokeInvitationAction = workshopAction(
  { permission: "member.manage", schema: z.object({ invitationId: idParamSchema }) },
  async ({ invitationId }, ctx) => {
    const invitation = await revokeInvitation(ctx.scope, invitationId);
    refresh(ctx.workshop.slug);
    return invitation;
  },
);

export const retryEmailAction = workshopAction({ permission: "outbox.retry", schema: z.object({ messageId: idParamSchema }) }, async ({ messageId }, ctx) => {
  const message = await retryFailedMessage(ctx.scope, messageId);
  refresh(ctx.workshop.slug);
  return message;
});
