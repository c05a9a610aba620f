// What the uploader says when an upload through the photo pipeline fails (photos and the logo).
import type { UploadThingError } from "uploadthing/server";

export const SERVICE_DOWN = "The photo service could not be reached, so the upload did not go through. Nothing was saved; try again in a moment.";

/** A message a person can act on, from whatever the upload client reports. */
export function uploadErrorMessage(err: UploadThingError): string {
  // The browser's PUT to the service failed, or the service itself answered with an error.
  if (err.code === "UPLOAD_FAILED" || err.code === "INTERNAL_CLIENT_ERROR") return SERVICE_DOWN;
  return err.message || "The upload did not go through. Nothing was saved; try again.";
}
