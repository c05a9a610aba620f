// The two halves of a logo upload, as the `workshopLogo` file route (lib/photos/file-router.ts)
// runs them — the photo pipeline's steps for one small image:
// 1. authoriseLogoUpload — the route's middleware: the signed-in member is the workshop's owner
//    (through the authorization helper) and offers one image within the limits.
// 2. ingestUploadedLogo — `onUploadComplete`, on the upload service's signed callback: read the
//    bytes, check they are an image, store a metadata-free PNG of at most 512 px, delete the
//    original, then point the workshop at it and delete the logo it replaces. Whatever fails, what
//    was stored for this upload is deleted again and the workshop keeps its logo.
import { resolveMemberAccess, resolveWorkshopAccess } from "@/lib/auth/workshop-access";
import { setWorkshopLogo } from "@/lib/data/workshop-logo";
import { AppError, toErrorBody } from "@/lib/http/errors";
import type { LogoUploadInput, LogoUploadResult } from "@/lib/schemas/workshop-logo";
import { prepareLogo } from "./logo-image";
import { LOGO_UPLOAD_LIMITS, MAX_LOGO_BYTES, uploadBatchProblem, type ClaimedFile } from "./rules";
import { deleteStoredFiles, readStoredFile, storeFile } from "./store";

/** What the middleware hands to the callback (signed by the upload service in between). */
export type LogoUploadMetadata = { slug: string; userId: number };

const OWNER_ONLY = "Only the workshop's owner changes its logo.";

export async function authoriseLogoUpload(input: LogoUploadInput, files: readonly ClaimedFile[]): Promise<LogoUploadMetadata> {
  const ctx = await resolveWorkshopAccess(input.workshop);
  if (!ctx.can("settings.manage")) throw new AppError("forbidden", OWNER_ONLY);
  const problem = uploadBatchProblem(files, LOGO_UPLOAD_LIMITS);
  if (problem) throw new AppError("validation_failed", problem.message, [problem]);
  return { slug: ctx.workshop.slug, userId: ctx.scope.userId };
}

export async function ingestUploadedLogo(meta: LogoUploadMetadata, file: { key: string; name: string }): Promise<LogoUploadResult> {
  let storedKey: string | null = null;
  try {
    // The membership is read again: the owner may have been demoted since the upload began.
    const { scope, can } = await resolveMemberAccess(meta.userId, meta.slug);
    if (!can("settings.manage")) throw new AppError("forbidden", OWNER_ONLY);
    const original = await readStoredFile(file.key, MAX_LOGO_BYTES);
    const logo = await prepareLogo(original, file.name);
    storedKey = (await storeFile(logo.bytes, "workshop-logo.png", logo.contentType)).key;
    // The original may carry metadata (a phone's GPS position among it): it goes now.
    await deleteStoredFiles([file.key]);
    const { previousKey } = await setWorkshopLogo(scope, storedKey, { width: logo.width, height: logo.height, bytes: logo.bytes.length });
    storedKey = null; // in use now: never cleaned up below
    if (previousKey) await deleteStoredFiles([previousKey]).catch((e) => console.error("[logo] could not delete the replaced logo", previousKey, e));
    return { ok: true, width: logo.width, height: logo.height };
  } catch (err) {
    const keys = storedKey ? [file.key, storedKey] : [file.key];
    await deleteStoredFiles(keys).catch((e) => console.error("[logo] could not clean up after a failed upload", keys, e));
    const { body } = toErrorBody(err);
    if (body.error.code === "internal") console.error("[logo] processing failed", file.key, err);
    return { ok: false, code: body.error.code, message: body.error.message };
  }
}
