// Test photos made with sharp: real JPEGs carrying camera metadata and a GPS position (an invented
// spot), the kind a phone writes, so tests can check what the app serves has none of it.
import sharp from "sharp";

/** Where the test "camera" was: 51°30'12.34" N, 0°07'39" W written as EXIF rationals. */
export const TEST_GPS = { latitude: 51 + 30 / 60 + 12.34 / 3600, longitude: -(7 / 60 + 39 / 3600) };

const GPS_EXIF = {
  IFD0: { Make: "Invented Camera Works", Model: "Bench Test 1", Copyright: "Test Luthier example.com" },
  IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 1234/100", GPSLongitudeRef: "W", GPSLongitude: "0/1 7/1 39/1" },
};

/** Pixels that do not compress to nothing: a gradient with seeded noise. */
function pixels(width: number, height: number, seed: number): Buffer {
  const raw = Buffer.alloc(width * height * 3);
  let s = seed * 7919 + 13;
  for (let i = 0; i < raw.length; i++) {
    s = (s * 1103515245 + 12345) & 0x7fffffff;
    raw[i] = ((i % (width * 3)) / (width * 3)) * 200 + (s % 56);
  }
  return raw;
}

/** A JPEG with EXIF: camera make/model and a GPS position; `orientation` sets the EXIF Orientation tag. */
export async function jpegWithGps(width = 640, height = 480, opts: { seed?: number; orientation?: number; quality?: number } = {}): Promise<Buffer> {
  let img = sharp(pixels(width, height, opts.seed ?? 1), { raw: { width, height, channels: 3 } }).jpeg({ quality: opts.quality ?? 85 });
  img = img.withExif(GPS_EXIF);
  if (opts.orientation) img = img.withMetadata({ orientation: opts.orientation }).withExifMerge(GPS_EXIF);
  return img.toBuffer();
}

export async function plainPng(width = 120, height = 90, seed = 3): Promise<Buffer> {
  return sharp(pixels(width, height, seed), { raw: { width, height, channels: 3 } }).png().toBuffer();
}

/** Text that claims to be a photo by its name only. */
export const NOT_AN_IMAGE = Buffer.from("Neck: maple, 3-piece. Fretboard: rosewood. This is a text file, not a photo.\n".repeat(20));
