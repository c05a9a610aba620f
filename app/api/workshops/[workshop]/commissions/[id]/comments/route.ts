// GET  /api/workshops/[workshop]/commissions/[id]/comments – the conversation between client and workshop.
// POST /api/workshops/[workshop]/commissions/[id]/comments – add to it (anyone who can see the commission).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { addComment, listComments } from "@/lib/data/commission-comments";
import { readJson } from "@/lib/http/respond";
import { commentSchema } from "@/lib/schemas/commission";
import { idParamSchema } from "@/lib/schemas/ids";

const params = z.object({ id: idParamSchema });

export const GET = withWorkshop({ permission: "commission.read", params }, async (_req, { scope, params }) => {
  return NextResponse.json({ comments: await listComments(scope, params.id) });
});

export const POST = withWorkshop({ permission: "commission.read", params }, async (req, { scope, params }) => {
  const { body } = await readJson(req, commentSchema);
  return NextResponse.json({ comment: await addComment(scope, params.id, body) }, { status: 201 });
});
