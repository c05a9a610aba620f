// The workshop logo as the app keeps it (prepareLogo, sharp), read back by the PNG format itself
// (tests/support/png-chunks.ts, ISO/IEC 15948): a PNG within 512 px, proportions kept, no metadata
// chunks (eXIf, iCCP, text chunks), transparency kept; non-images refused by their content.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { prepareLogo } from "@/lib/photos/logo-image";
import { LOGO_EDGE_PX, LOGO_UPLOAD_LIMITS, MAX_LOGO_BYTES, uploadBatchProblem } from "@/lib/photos/rules";
import { pngChunkTypes, pngSize } from "../../support/png-chunks";
import { jpegWithGps, NOT_AN_IMAGE } from "../../support/photos";

// Chunks that carry camera, colour-profile or text metadata (PNG §11.3): none may survive. (pHYs,
// the pixel density, says nothing about where or with what the picture was taken.)
const METADATA_CHUNKS = ["eXIf", "iCCP", "tEXt", "zTXt", "iTXt", "tIME", "sRGB", "gAMA", "cHRM"];

describe("prepareLogo", () => {
  it("keeps a PNG at most 512 px across, in proportion, without the upload's EXIF/GPS or any metadata chunk", async () => {
    const upload = await jpegWithGps(1600, 1200, { seed: 9 });
    const logo = await prepareLogo(upload, "logo.jpg");
    expect(logo.contentType).toBe("image/png");
    expect(pngSize(logo.bytes)).toEqual({ width: LOGO_EDGE_PX, height: 384 }); // 1600 × 1200 scaled by 512/1600
    expect([logo.width, logo.height]).toEqual([512, 384]);
    const chunks = pngChunkTypes(logo.bytes);
    expect(chunks[0]).toBe("IHDR");
    expect(chunks.filter((c) => METADATA_CHUNKS.includes(c))).toEqual([]);
    expect(logo.bytes.includes(Buffer.from("Invented Camera Works"))).toBe(false);
  });

  it("never enlarges a small logo and keeps its transparency", async () => {
    const small = await sharp({ create: { width: 120, height: 40, channels: 4, background: { r: 113, g: 46, b: 40, alpha: 0.5 } } }).png().toBuffer();
    const logo = await prepareLogo(small, "mark.png");
    expect(pngSize(logo.bytes)).toEqual({ width: 120, height: 40 });
    const meta = await sharp(logo.bytes).metadata();
    expect([meta.format, meta.hasAlpha]).toEqual(["png", true]);
  });

  it("refuses a file that is not an image by its content, whatever its name", async () => {
    await expect(prepareLogo(NOT_AN_IMAGE, "logo.png")).rejects.toMatchObject({ code: "validation_failed" });
  });
});

describe("logo upload limits", () => {
  const png = (name: string, size = 1000) => ({ name, size, type: "image/png" });
  it("takes one image of at most 2 MB and says so otherwise", () => {
    expect(MAX_LOGO_BYTES).toBe(2 * 1024 * 1024); // UploadThing's "2MB" is 1024-based, as for photos
    expect(uploadBatchProblem([png("logo.png", MAX_LOGO_BYTES)], LOGO_UPLOAD_LIMITS)).toBeNull();
    expect(uploadBatchProblem([png("big.png", 3 * 1024 * 1024)], LOGO_UPLOAD_LIMITS)?.message).toBe("big.png is 3 MB; the image may be at most 2 MB.");
    expect(uploadBatchProblem([png("a.png"), png("b.png")], LOGO_UPLOAD_LIMITS)?.message).toBe("Choose one image (you chose 2).");
    expect(uploadBatchProblem([], LOGO_UPLOAD_LIMITS)?.message).toBe("Choose an image.");
    expect(uploadBatchProblem([{ name: "logo.svg", size: 10, type: "image/svg+xml" }], LOGO_UPLOAD_LIMITS)?.message).toBe("logo.svg is not a JPEG, PNG, WebP or AVIF image.");
  });
});
