"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { workshopAction } from "@/lib/auth/actions";
import { removePhoto } from "@/lib/data/photos";
import { deleteStoredFiles } from "@/lib/photos/store";
import { photosPagePath } from "@/lib/photos/urls";
import { idParamSchema } from "@/lib/schemas/ids";

// The slug comes from the page's URL; the workshop id from the caller's membership.
export const removePhotoAction = workshopAction(
  { permission: "photo.remove", schema: z.object({ commissionId: idParamSchema, photoId: idParamSchema }) },
  async ({ commissionId, photoId }, ctx) => {
    const removed = await removePhoto(ctx.scope, commissionId, photoId, deleteStoredFiles);
    revalidatePath(photosPagePath(ctx.workshop.slug, commissionId));
    return removed;
  },
);
