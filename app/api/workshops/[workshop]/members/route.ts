// GET /api/workshops/[workshop]/members – owner, bookkeeper: the member list; builder: names only; client: 403.
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { listMemberNames, listMembers } from "@/lib/data/memberships";
import { memberNameOutSchema, memberOutSchema } from "@/lib/schemas/member";

export const GET = withWorkshop({ permission: "member.names" }, async (_req, { scope, can }) =>
  can("member.read")
    ? NextResponse.json({ members: z.array(memberOutSchema).parse(await listMembers(scope)) })
    : NextResponse.json({ members: z.array(memberNameOutSchema).parse(await listMemberNames(scope)) }),
);
