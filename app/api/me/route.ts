// GET /api/me – the signed-in user and the workshops they belong to, with their role in each.
import { NextResponse } from "next/server";
import { withUser } from "@/lib/auth/route-handlers";
import { listMembershipsForUser } from "@/lib/data/memberships";
import { meOutSchema } from "@/lib/schemas/member";

export const GET = withUser(async (_req, { user }) =>
  NextResponse.json(meOutSchema.parse({ user: { id: user.id, email: user.email, name: user.name }, memberships: await listMembershipsForUser(user.id) })),
);
