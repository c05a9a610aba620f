// Photo files at the upload service, through the UploadThing server SDK. Every file is private:
// it can be fetched only through a URL signed with our key, which only this module makes and
// which never leaves the server (browsers get the bytes from our authorised route).
import { UTFile } from "uploadthing/server";
import type { UploadFileResult } from "uploadthing/types";
import { AppError } from "@/lib/http/errors";
import { utapi } from "@/lib/services/uploadthing";

const UNAVAILABLE = "The photo store is not reachable right now. Nothing was saved; try again in a moment.";
const unavailable = (cause?: unknown) => {
  if (cause) console.error("[photos] upload service:", cause);
  return new AppError("unavailable", UNAVAILABLE, undefined, 5);
};

/** How long a signed URL the server fetches through lives. */
const SIGNED_TTL_SECONDS = 60;
const FETCH_TIMEOUT_MS = 20_000;

async function signedUrl(key: string): Promise<string> {
  try {
    return (await utapi().generateSignedURL(key, { expiresIn: SIGNED_TTL_SECONDS })).ufsUrl;
  } catch (err) {
    throw unavailable(err);
  }
}

/** Opens a stored file: the upstream response, whose body the caller streams on (404 when gone). */
export async function openStoredFile(key: string): Promise<Response> {
  let res: Response;
  try {
    res = await fetch(await signedUrl(key), { signal: AbortSignal.timeout(FETCH_TIMEOUT_MS), cache: "no-store" });
  } catch (err) {
    throw err instanceof AppError ? err : unavailable(err);
  }
  if (res.status === 404) throw new AppError("not_found", "This photo's file is no longer stored.");
  if (!res.ok || !res.body) throw unavailable(`GET ${key}: ${res.status}`);
  return res;
}

/** Reads a stored file whole (an upload to process), refusing more than `maxBytes`. */
export async function readStoredFile(key: string, maxBytes: number): Promise<Buffer> {
  const res = await openStoredFile(key);
  const declared = Number(res.headers.get("content-length") ?? "0");
  if (declared > maxBytes) {
    await res.body?.cancel();
    throw new AppError("validation_failed", "The uploaded file is larger than allowed.");
  }
  const bytes = Buffer.from(await res.arrayBuffer());
  if (bytes.length > maxBytes) throw new AppError("validation_failed", "The uploaded file is larger than allowed.");
  return bytes;
}

export interface StoredFile {
  key: string;
  size: number;
}

/** Stores bytes as a new private file; its key and size. */
export async function storeFile(bytes: Buffer, name: string, type: string): Promise<StoredFile> {
  let result: UploadFileResult;
  try {
    result = await utapi().uploadFiles(new UTFile([new Uint8Array(bytes)], name, { type }), { acl: "private" });
  } catch (err) {
    throw unavailable(err);
  }
  if (result.error || !result.data) throw unavailable(result.error);
  return { key: result.data.key, size: bytes.length };
}

/** Deletes stored files (already-deleted keys are fine); throws when the service cannot be reached. */
export async function deleteStoredFiles(keys: string[]): Promise<void> {
  if (keys.length === 0) return;
  try {
    await utapi().deleteFiles(keys);
  } catch (err) {
    throw unavailable(err);
  }
}
