// The app's UploadThing file router, served by app/api/uploadthing/route.ts: `stagePhoto` (a
// commission's photos) and `workshopLogo` (the owner's logo for the workshop). The SDK checks the
// claimed type, size and count against the route config after our middleware has done the same
// with messages a person understands; the bytes themselves are judged in onUploadComplete
// (lib/photos/upload-flow.ts, lib/photos/logo-flow.ts).
import { ZodError } from "zod";
import { createUploadthing, type FileRouter } from "uploadthing/next";
import { UploadThingError } from "uploadthing/server";
import { toErrorBody, zodIssues, type ErrorCode } from "@/lib/http/errors";
import { photoUploadInputSchema } from "@/lib/schemas/photo";
import { logoUploadInputSchema } from "@/lib/schemas/workshop-logo";
import { authoriseLogoUpload, ingestUploadedLogo } from "./logo-flow";
import { MAX_PHOTOS_PER_UPLOAD } from "./rules";
import { authorisePhotoUpload, ingestUploadedPhoto } from "./upload-flow";

type UtCode = ConstructorParameters<typeof UploadThingError>[0] extends infer O ? (O extends { code: infer C } ? C : never) : never;

/** Our error body in the shape the SDK sends back (plain JSON). */
type UploadErrorBody = { message: string; error: { code: ErrorCode; message: string; issues?: Array<{ path: string; message: string }> } };

// The SDK answers with the status of its own error code; ours map onto the nearest one.
const UT_CODES: Partial<Record<ErrorCode, UtCode>> = {
  bad_request: "BAD_REQUEST",
  validation_failed: "BAD_REQUEST",
  conflict: "BAD_REQUEST",
  rate_limited: "BAD_REQUEST",
  unauthenticated: "FORBIDDEN",
  forbidden: "FORBIDDEN",
  not_found: "NOT_FOUND",
};

function body(code: ErrorCode, message: string, issues?: Array<{ path: string; message: string }>): UploadErrorBody {
  return { message, error: issues ? { code, message, issues } : { code, message } };
}

/** Anything the middleware throws, as the SDK's error carrying our error body. */
function toUploadError(err: unknown): UploadThingError<UploadErrorBody> {
  const { error } = toErrorBody(err).body;
  return new UploadThingError<UploadErrorBody>({
    code: UT_CODES[error.code] ?? "INTERNAL_SERVER_ERROR",
    message: error.message,
    data: body(error.code, error.message, error.issues),
  });
}

/** Runs a route's middleware; whatever it throws leaves as the SDK's error carrying our error body. */
async function asUploadError<T>(middleware: () => Promise<T>): Promise<T> {
  try {
    return await middleware();
  } catch (err) {
    throw toUploadError(err);
  }
}

function isUploadErrorBody(v: unknown): v is UploadErrorBody {
  return !!v && typeof v === "object" && typeof (v as UploadErrorBody).error?.code === "string";
}

/**
 * Error answers keep the SDK's `message` (the client shows it) and add our usual
 * `{ error: { code, message, issues? } }`, with field paths for a bad input.
 */
export function formatUploadError(err: UploadThingError): UploadErrorBody {
  if (isUploadErrorBody(err.data)) return err.data;
  if (err.cause instanceof ZodError) {
    const issues = zodIssues(err.cause).map((i) => ({ ...i, path: i.path ? `input.${i.path}` : "input" }));
    return body("validation_failed", issues[0]?.message ?? "Some fields are not valid.", issues);
  }
  if (err.code === "NOT_FOUND") return body("not_found", err.message);
  if (err.code === "FORBIDDEN") return body("forbidden", err.message);
  if (err.code.startsWith("INTERNAL")) return body("internal", "The upload could not be started. Nothing was saved; try again in a moment.");
  return body("bad_request", err.message);
}

const f = createUploadthing({ errorFormatter: formatUploadError });

export const photoFileRouter = {
  stagePhoto: f({ image: { maxFileSize: "8MB", maxFileCount: MAX_PHOTOS_PER_UPLOAD, minFileCount: 1, acl: "private" } })
    .input(photoUploadInputSchema)
    .middleware(({ input, files }) => asUploadError(() => authorisePhotoUpload(input, files)))
    // Never throws: a refusal is the file's server data, which the uploader shows (the SDK would
    // otherwise swallow the error and the upload would look successful).
    .onUploadComplete(({ metadata, file }) => ingestUploadedPhoto(metadata, file)),
  // One image of at most 2 MB (MAX_LOGO_BYTES), kept as a PNG of at most 512 px (LOGO_EDGE_PX).
  workshopLogo: f({ image: { maxFileSize: "2MB", maxFileCount: 1, minFileCount: 1, acl: "private" } })
    .input(logoUploadInputSchema)
    .middleware(({ input, files }) => asUploadError(() => authoriseLogoUpload(input, files)))
    .onUploadComplete(({ metadata, file }) => ingestUploadedLogo(metadata, file)),
} satisfies FileRouter;

export type PhotoFileRouter = typeof photoFileRouter;
