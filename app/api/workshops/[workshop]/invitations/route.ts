// GET  /api/workshops/[workshop]/invitations – pending and recent invitations (owner).
// POST /api/workshops/[workshop]/invitations – invite {email, role}; the e-mail goes out through the outbox (owner).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { listInvitations } from "@/lib/data/invitations";
import { readJson } from "@/lib/http/respond";
import { inviteMember } from "@/lib/members/invitations";
import { invitationCreateSchema, invitationOutSchema } from "@/lib/schemas/member";

export const GET = withWorkshop({ permission: "member.manage" }, async (_req, { scope }) =>
  NextResponse.json({ invitations: z.array(invitationOutSchema).parse(await listInvitations(scope)) }),
);

export const POST = withWorkshop({ permission: "member.manage" }, async (req, { scope }) => {
  const input = await readJson(req, invitationCreateSchema);
  return NextResponse.json({ invitation: invitationOutSchema.parse(await inviteMember(scope, input)) }, { status: 201 });
});
