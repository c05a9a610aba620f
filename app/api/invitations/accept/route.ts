// POST /api/invitations/accept – the signed-in user accepts an invitation sent to their address {token}.
import { NextResponse } from "next/server";
import { withUser } from "@/lib/auth/route-handlers";
import { readJson } from "@/lib/http/respond";
import { acceptInvitationAsUser } from "@/lib/members/invitations";
import { invitationAcceptSchema } from "@/lib/schemas/member";

export const POST = withUser(async (req, { user }) => {
  const { token } = await readJson(req, invitationAcceptSchema);
  const { slug } = await acceptInvitationAsUser(token, user);
  return NextResponse.json({ workshop: { slug } });
});
