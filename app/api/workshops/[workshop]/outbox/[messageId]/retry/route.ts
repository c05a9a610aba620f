// POST /api/workshops/[workshop]/outbox/[messageId]/retry – queue a failed e-mail again (owner).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { retryFailedMessage } from "@/lib/data/outbox";
import { idParamSchema } from "@/lib/schemas/member";

export const POST = withWorkshop({ permission: "outbox.retry", params: z.object({ messageId: idParamSchema }) }, async (_req, { scope, params }) =>
  NextResponse.json({ message: await retryFailedMessage(scope, params.messageId) }),
);
