// GET /api/workshops/[workshop]/outbox?status=failed – the workshop's e-mail in one status (owner).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { listOutboxMessages } from "@/lib/data/outbox";
import { readQuery } from "@/lib/http/respond";

const query = z.object({ status: z.enum(["pending", "sending", "sent", "failed"]).default("failed") });

export const GET = withWorkshop({ permission: "outbox.read" }, async (req, { scope }) => {
  const { status } = readQuery(req, query);
  return NextResponse.json({ messages: await listOutboxMessages(scope, status) });
});
