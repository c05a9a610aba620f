import { z } from "zod";

// The stage photo: what an upload asks for (shared by the upload form and the file route's input
// parser), and what the photo routes answer.

export const photoCaptionSchema = z
  .string({ error: "Add a caption: what does the photo show?" })
  .trim()
  .min(1, "Add a caption: what does the photo show?")
  .max(300, "Keep the caption under 300 characters.");

/** The upload's input: which workshop (its slug, as in the page URL) and commission, and the caption. */
export const photoUploadInputSchema = z.object({
  workshop: z.string().min(1).max(64),
  commissionId: z.int("Say which commission the photos are for.").positive().max(2_147_483_647),
  caption: photoCaptionSchema,
});
export type PhotoUploadInput = z.infer<typeof photoUploadInputSchema>;

export const photoVariantSchema = z.enum(["full", "thumb"]);
export type PhotoVariant = z.infer<typeof photoVariantSchema>;

export interface PhotoOut {
  id: number;
  commissionId: number;
  stage: string;
  stageLabel: string;
  caption: string;
  uploadedBy: { id: number; name: string };
  width: number;
  height: number;
  thumbWidth: number;
  thumbHeight: number;
  bytes: number;
  createdAt: string;
}

/** Photos of one stage, in the order of the workshop's stage line. */
export interface PhotoStageGroup {
  stage: string;
  label: string;
  photos: PhotoOut[];
}

/** What the upload's `onUploadComplete` answers for each file (the client reads it as serverData). */
export type PhotoUploadResult = { ok: true; photoId: number; stage: string } | { ok: false; code: string; message: string };
