// POST /api/workshops – create a workshop; the signed-in creator becomes its owner.
import { NextResponse } from "next/server";
import { withUser } from "@/lib/auth/route-handlers";
import { createWorkshop } from "@/lib/data/workshops";
import { readJson } from "@/lib/http/respond";
import { workshopCreateSchema } from "@/lib/schemas/workshop";

export const POST = withUser(async (req, { user }) => {
  const input = await readJson(req, workshopCreateSchema);
  const workshop = await createWorkshop(user.id, input);
  return NextResponse.json({ workshop, role: "owner" }, { status: 201 });
});
