// Processing an uploaded photo with sharp, checked by reading the output back by the published
// formats (tests/support/exif.ts: JPEG markers per ITU-T T.81, EXIF per CIPA DC-008) and by
// sharp's own metadata reader.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { inspectImage, preparePhoto } from "@/lib/photos/images";
import { DISPLAY_EDGE_PX, THUMB_EDGE_PX } from "@/lib/photos/rules";
import { gpsFromExif, jpegAppSegments, jpegExifTiff } from "../../support/exif";
import { jpegWithGps, NOT_AN_IMAGE, plainPng, TEST_GPS } from "../../support/photos";

describe("preparePhoto", () => {
  it("serves versions without the GPS position or any other EXIF/XMP/IPTC the upload carried", async () => {
    const upload = await jpegWithGps(800, 600);
    // The test image really carries the position (read back from its APP1 segment).
    const gps = gpsFromExif(jpegExifTiff(upload)!);
    expect(gps!.latitude).toBeCloseTo(TEST_GPS.latitude, 6);
    expect(gps!.longitude).toBeCloseTo(TEST_GPS.longitude, 6);
    expect(jpegAppSegments(upload)).toContainEqual({ app: 1, id: "Exif" });

    const out = await preparePhoto(upload, "neck.jpg");
    for (const v of [out.full, out.thumb]) {
      // No application segment at all: no EXIF, XMP, ICC or IPTC.
      expect(jpegAppSegments(v.bytes)).toEqual([]);
      expect(jpegExifTiff(v.bytes)).toBeNull();
      const meta = await sharp(v.bytes).metadata();
      expect(meta.format).toBe("jpeg");
      expect([meta.exif, meta.xmp, meta.iptc, meta.icc]).toEqual([undefined, undefined, undefined, undefined]);
      expect(v.bytes.includes(Buffer.from("Invented Camera Works"))).toBe(false);
    }
    expect(out.contentType).toBe("image/jpeg");
    expect(out.sourceFormat).toBe("jpeg");
  });

  it("makes a thumbnail within the thumbnail edge and keeps the display version's proportions", async () => {
    const out = await preparePhoto(await jpegWithGps(3000, 2000), "body.jpg");
    expect([out.full.width, out.full.height]).toEqual([DISPLAY_EDGE_PX, Math.round((DISPLAY_EDGE_PX * 2000) / 3000)]);
    expect([out.thumb.width, out.thumb.height]).toEqual([THUMB_EDGE_PX, THUMB_EDGE_PX * (2 / 3)]);
    const meta = await sharp(out.thumb.bytes).metadata();
    expect([meta.width, meta.height]).toEqual([out.thumb.width, out.thumb.height]);
  });

  it("does not enlarge a small photo", async () => {
    const out = await preparePhoto(await plainPng(120, 90), "tiny.png");
    expect([out.full.width, out.full.height, out.thumb.width]).toEqual([120, 90, 120]);
  });

  it("applies the EXIF orientation before dropping it (Orientation 6: rotate 90° clockwise, CIPA DC-008 §4.6.4)", async () => {
    const out = await preparePhoto(await jpegWithGps(64, 48, { orientation: 6 }), "portrait.jpg");
    expect([out.full.width, out.full.height]).toEqual([48, 64]);
    expect((await sharp(out.full.bytes).metadata()).orientation).toBeUndefined();
  });

  it("judges the content, not the name: text called .jpg, a truncated JPEG and an SVG are refused", async () => {
    await expect(preparePhoto(NOT_AN_IMAGE, "fretboard.jpg")).rejects.toMatchObject({
      code: "validation_failed",
      message: "fretboard.jpg is not a photo we can read: upload a JPEG, PNG, WebP or AVIF image.",
    });
    const jpeg = await jpegWithGps(400, 300);
    await expect(preparePhoto(jpeg.subarray(0, Math.floor(jpeg.length / 3)), "cut.jpg")).rejects.toMatchObject({ code: "validation_failed" });
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><rect width="10" height="10"/></svg>');
    await expect(inspectImage(svg, "logo.jpg")).rejects.toMatchObject({ code: "validation_failed" });
  });
});
