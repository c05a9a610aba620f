// DELETE /api/workshops/[workshop]/commissions/[id]/photos/[photoId] – remove a photo (photo.remove:
//        the owner, or the commission's builder); recorded in the audit log, its files deleted.
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { removePhoto } from "@/lib/data/photos";
import { deleteStoredFiles } from "@/lib/photos/store";
import { idParamSchema } from "@/lib/schemas/ids";

const params = z.object({ id: idParamSchema, photoId: idParamSchema });

export const DELETE = withWorkshop({ permission: "photo.remove", params }, async (_req, { scope, params }) => {
  const removed = await removePhoto(scope, params.id, params.photoId, deleteStoredFiles);
  return NextResponse.json({ removed });
});
