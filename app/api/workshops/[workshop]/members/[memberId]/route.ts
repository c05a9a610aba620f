// PATCH  /api/workshops/[workshop]/members/[memberId] – change a member's role (owner; the last owner stays).
// DELETE /api/workshops/[workshop]/members/[memberId] – remove a member (owner; never the last owner).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { changeMemberRole, removeMember } from "@/lib/data/memberships";
import { readJson } from "@/lib/http/respond";
import { idParamSchema, memberOutSchema, roleChangeSchema } from "@/lib/schemas/member";

const params = z.object({ memberId: idParamSchema });

export const PATCH = withWorkshop({ permission: "member.manage", params }, async (req, { scope, params }) => {
  const { role } = await readJson(req, roleChangeSchema);
  return NextResponse.json({ member: memberOutSchema.parse(await changeMemberRole(scope, params.memberId, role)) });
});

export const DELETE = withWorkshop({ permission: "member.manage", params }, async (_req, { scope, params }) => {
  await removeMember(scope, params.memberId);
  return new NextResponse(null, { status: 204 });
});
