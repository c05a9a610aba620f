// DELETE /api/workshops/[workshop]/invitations/[invitationId] – revoke a pending invitation (owner).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { revokeInvitation } from "@/lib/data/invitations";
import { idParamSchema, invitationOutSchema } from "@/lib/schemas/member";

export const DELETE = withWorkshop({ permission: "member.manage", params: z.object({ invitationId: idParamSchema }) }, async (_req, { scope, params }) =>
  NextResponse.json({ invitation: invitationOutSchema.parse(await revokeInvitation(scope, params.invitationId)) }),
);
