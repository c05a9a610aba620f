// Turning an uploaded photo into what we serve, with sharp: the bytes decide whether it is an
// image (never its name or claimed type), and both versions are re-encoded from pixels only, so
// EXIF (with any GPS position), XMP, IPTC and ICC stay behind. Orientation is applied first, so a
// phone photo still stands the right way up without its orientation tag. JPEG, because it encodes
// several times faster than WebP and the upload waits for it; transparency is laid on white.
import sharp, { type Metadata } from "sharp";
import { AppError } from "@/lib/http/errors";
import { ACCEPTED_FORMATS, DISPLAY_EDGE_PX, MAX_PHOTO_PIXELS, THUMB_EDGE_PX } from "./rules";

export interface ImageVersion {
  bytes: Buffer;
  width: number;
  height: number;
}

export interface PreparedPhoto {
  /** The format the upload really is (sharp's name). */
  sourceFormat: string;
  contentType: "image/jpeg";
  full: ImageVersion;
  thumb: ImageVersion;
}

/** `what`: how the message names the upload ("a photo"; "an image" for the logo). */
const notAnImage = (name: string, what = "a photo") =>
  new AppError("validation_failed", `${name} is not ${what} we can read: upload a JPEG, PNG, WebP or AVIF image.`, [
    { path: "file", message: "The file's content is not a JPEG, PNG, WebP or AVIF image." },
  ]);

/** What the bytes are, read from their header by sharp; refuses anything but the accepted formats. */
export async function inspectImage(bytes: Buffer, name: string, what = "a photo"): Promise<{ format: string; width: number; height: number }> {
  let meta: Metadata;
  try {
    meta = await sharp(bytes, { limitInputPixels: false }).metadata();
  } catch {
    throw notAnImage(name, what);
  }
  const format = meta.format ?? "";
  if (!(ACCEPTED_FORMATS as readonly string[]).includes(format) || !meta.width || !meta.height) throw notAnImage(name, what);
  if (meta.width * meta.height > MAX_PHOTO_PIXELS) {
    throw new AppError("validation_failed", `${name} is ${meta.width} × ${meta.height} pixels; photos may be at most ${MAX_PHOTO_PIXELS / 1e6} megapixels.`, [
      { path: "file", message: "Too many pixels." },
    ]);
  }
  return { format, width: meta.width, height: meta.height };
}

async function render(bytes: Buffer, edge: number, quality: number): Promise<ImageVersion> {
  const { data, info } = await sharp(bytes, { limitInputPixels: MAX_PHOTO_PIXELS, failOn: "error" })
    .rotate()
    .resize({ width: edge, height: edge, fit: "inside", withoutEnlargement: true })
    .flatten({ background: "#ffffff" })
    .jpeg({ quality, progressive: true })
    .toBuffer({ resolveWithObject: true });
  return { bytes: data, width: info.width, height: info.height };
}

/** Checks the upload is an image and makes the display version and the thumbnail, both metadata-free. */
export async function preparePhoto(bytes: Buffer, name: string): Promise<PreparedPhoto> {
  const { format } = await inspectImage(bytes, name);
  try {
    const full = await render(bytes, DISPLAY_EDGE_PX, 84);
    const thumb = await render(bytes, THUMB_EDGE_PX, 74);
    return { sourceFormat: format, contentType: "image/jpeg", full, thumb };
  } catch {
    // A header that parses over a body that does not (truncated or corrupt).
    throw notAnImage(name);
  }
}
