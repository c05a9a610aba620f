// The two halves of a photo upload, as the file route (lib/photos/file-router.ts) runs them.
//
// 1. authorisePhotoUpload — the route's middleware, on the browser's request for upload URLs: the
//    signed-in member, through the authorization helper, may add these files to this commission.
// 2. ingestUploadedPhoto — `onUploadComplete`, on the upload service's signed callback once the
//    bytes are in: read them, check they are an image, store a stripped display version and a
//    thumbnail, delete the original, then write the row. Whatever fails, what was stored for this
//    file is deleted again and no row is written, so nothing half-made remains.
import { resolveMemberAccess, resolveWorkshopAccess } from "@/lib/auth/workshop-access";
import { addPhoto, checkPhotoUpload, findPhotoBySourceKey } from "@/lib/data/photos";
import { AppError, toErrorBody } from "@/lib/http/errors";
import type { PhotoUploadInput, PhotoUploadResult } from "@/lib/schemas/photo";
import { preparePhoto } from "./images";
import { MAX_PHOTO_BYTES, uploadBatchProblem, type ClaimedFile } from "./rules";
import { deleteStoredFiles, readStoredFile, storeFile, type StoredFile } from "./store";

/** What the middleware hands to the callback (signed by the upload service in between). */
export type PhotoUploadMetadata = {
  slug: string;
  userId: number;
  commissionId: number;
  caption: string;
};

export async function authorisePhotoUpload(input: PhotoUploadInput, files: readonly ClaimedFile[]): Promise<PhotoUploadMetadata> {
  const ctx = await resolveWorkshopAccess(input.workshop);
  if (!ctx.can(["photo.upload", "photo.reference"])) throw new AppError("forbidden", "Only the commission's builder and the workshop's owner can add photos.");
  await checkPhotoUpload(ctx.scope, input.commissionId);
  const problem = uploadBatchProblem(files);
  if (problem) throw new AppError("validation_failed", problem.message, [problem]);
  return { slug: ctx.workshop.slug, userId: ctx.scope.userId, commissionId: input.commissionId, caption: input.caption };
}

/** A file name without its extension and anything odd, for the stored versions' names. */
function baseName(name: string): string {
  return (name.replace(/\.[^.]*$/, "").replace(/[^A-Za-z0-9 _-]+/g, "_").trim() || "photo").slice(0, 80);
}

export async function ingestUploadedPhoto(meta: PhotoUploadMetadata, file: { key: string; name: string; size: number }): Promise<PhotoUploadResult> {
  const stored: string[] = [];
  try {
    const { scope } = await resolveMemberAccess(meta.userId, meta.slug);
    // The service may call back twice for one upload; the second time the photo is already here.
    const earlier = await findPhotoBySourceKey(scope, meta.commissionId, file.key);
    if (earlier) return { ok: true, photoId: earlier.id, stage: earlier.stage };

    const original = await readStoredFile(file.key, MAX_PHOTO_BYTES);
    const photo = await preparePhoto(original, file.name);
    // Both versions at once (the upload waits for this callback). Wait for both to settle, so a
    // version that got in while the other failed is known, and deleted with the rest.
    const settled = await Promise.allSettled([
      storeFile(photo.full.bytes, `${baseName(file.name)}.jpg`, photo.contentType),
      storeFile(photo.thumb.bytes, `${baseName(file.name)}-thumb.jpg`, photo.contentType),
    ]);
    const kept = settled.flatMap((v) => (v.status === "fulfilled" ? [v.value] : []));
    stored.push(...kept.map((f) => f.key));
    const failed = settled.find((v): v is PromiseRejectedResult => v.status === "rejected");
    if (failed) throw failed.reason;
    const [full, thumb] = kept as [StoredFile, StoredFile];
    // The original still carries its metadata (a phone's GPS position among it): it goes now.
    await deleteStoredFiles([file.key]);

    const row = await addPhoto(scope, meta.commissionId, {
      sourceKey: file.key,
      originalName: file.name,
      originalBytes: original.length,
      fileKey: full.key,
      fileBytes: full.size,
      thumbKey: thumb.key,
      thumbBytes: thumb.size,
      contentType: photo.contentType,
      width: photo.full.width,
      height: photo.full.height,
      thumbWidth: photo.thumb.width,
      thumbHeight: photo.thumb.height,
      caption: meta.caption,
    });
    return { ok: true, photoId: row.id, stage: row.stage };
  } catch (err) {
    await deleteStoredFiles([file.key, ...stored]).catch((e) => console.error("[photos] could not clean up after a failed upload", file.key, stored, e));
    const { body } = toErrorBody(err);
    if (body.error.code === "internal") console.error("[photos] processing failed", file.key, err);
    return { ok: false, code: body.error.code, message: body.error.message };
  }
}
