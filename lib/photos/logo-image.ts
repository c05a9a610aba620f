// The workshop's logo as we keep it, made with sharp from what the owner uploads: the bytes decide
// whether it is an image (inspectImage, as for stage photos), then it is turned upright, fitted
// within LOGO_EDGE_PX and re-encoded as PNG from pixels only, so no EXIF, XMP, IPTC or ICC data
// remains and transparency survives. PNG is also what the build sheet's PDF library embeds.
import sharp from "sharp";
import { AppError } from "@/lib/http/errors";
import { inspectImage } from "./images";
import { LOGO_EDGE_PX, MAX_PHOTO_PIXELS } from "./rules";

export interface PreparedLogo {
  bytes: Buffer;
  width: number;
  height: number;
  contentType: "image/png";
}

export async function prepareLogo(bytes: Buffer, name: string): Promise<PreparedLogo> {
  await inspectImage(bytes, name, "an image");
  try {
    const { data, info } = await sharp(bytes, { limitInputPixels: MAX_PHOTO_PIXELS, failOn: "error" })
      .rotate()
      .resize({ width: LOGO_EDGE_PX, height: LOGO_EDGE_PX, fit: "inside", withoutEnlargement: true })
      .png({ compressionLevel: 9 })
      .toBuffer({ resolveWithObject: true });
    return { bytes: data, width: info.width, height: info.height, contentType: "image/png" };
  } catch {
    // A header that parses over a body that does not (truncated or corrupt).
    throw new AppError("validation_failed", `${name} is not an image we can read: upload a JPEG, PNG, WebP or AVIF image.`, [
      { path: "file", message: "The file's content is not a readable image." },
    ]);
  }
}
