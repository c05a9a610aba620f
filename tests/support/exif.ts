// Reading image metadata back by the published formats, independently of the code under test:
// - a JPEG keeps EXIF in an APP1 segment (marker FF E1) whose data starts with "Exif\0\0" and a
//   TIFF structure (JPEG File Interchange: ITU-T T.81 markers; CIPA DC-008-2019 "Exif 2.32" §4.5.4);
// - TIFF: byte order "II"/"MM", the number 42, the offset of IFD0; an IFD is a 2-byte count of
//   12-byte entries (tag, type, count, value or offset) (TIFF 6.0 §2);
// - the GPS IFD is reached through IFD0's tag 0x8825; latitude/longitude are tags 2/4, three
//   RATIONALs (degrees, minutes, seconds), with refs in tags 1/3 (CIPA DC-008-2019 §4.6.6);

export interface GpsPosition {
  latitude: number;
  longitude: number;
}

/** The TIFF structure of the first EXIF APP1 segment of a JPEG, or null when it has none. */
export function jpegExifTiff(jpeg: Buffer): Buffer | null {
  if (jpeg[0] !== 0xff || jpeg[1] !== 0xd8) throw new Error("not a JPEG (no SOI marker)");
  let at = 2;
  while (at + 4 <= jpeg.length && jpeg[at] === 0xff) {
    const marker = jpeg[at + 1]!;
    if (marker === 0xda || marker === 0xd9) break; // start of scan / end of image: no more metadata segments
    const length = jpeg.readUInt16BE(at + 2);
    if (marker === 0xe1 && jpeg.subarray(at + 4, at + 10).toString("latin1") === "Exif\0\0") return jpeg.subarray(at + 10, at + 2 + length);
    at += 2 + length;
  }
  return null;
}

/** The GPS position in a TIFF/EXIF structure (sharp's `metadata().exif` starts with "Exif\0\0"), or null. */
export function gpsFromExif(exif: Buffer): GpsPosition | null {
  const tiff = exif.subarray(0, 6).toString("latin1") === "Exif\0\0" ? exif.subarray(6) : exif;
  const little = tiff.subarray(0, 2).toString("latin1") === "II";
  const u16 = (o: number) => (little ? tiff.readUInt16LE(o) : tiff.readUInt16BE(o));
  const u32 = (o: number) => (little ? tiff.readUInt32LE(o) : tiff.readUInt32BE(o));
  if (u16(2) !== 42) throw new Error("not a TIFF structure");
  const entries = (ifd: number) => {
    const out = new Map<number, { type: number; count: number; valueAt: number }>();
    const n = u16(ifd);
    for (let i = 0; i < n; i++) {
      const e = ifd + 2 + i * 12;
      out.set(u16(e), { type: u16(e + 2), count: u32(e + 4), valueAt: e + 8 });
    }
    return out;
  };
  const gpsPointer = entries(u32(4)).get(0x8825);
  if (!gpsPointer) return null;
  const gps = entries(u32(gpsPointer.valueAt));
  const ascii = (tag: number) => {
    const e = gps.get(tag);
    return e ? String.fromCharCode(tiff[e.valueAt]!) : "";
  };
  const dms = (tag: number) => {
    const e = gps.get(tag);
    if (!e || e.type !== 5 || e.count !== 3) return null; // 5 = RATIONAL
    const at = u32(e.valueAt);
    const r = (k: number) => u32(at + k * 8) / u32(at + k * 8 + 4);
    return r(0) + r(1) / 60 + r(2) / 3600;
  };
  const lat = dms(2);
  const lon = dms(4);
  if (lat === null || lon === null) return null;
  return { latitude: ascii(1) === "S" ? -lat : lat, longitude: ascii(3) === "W" ? -lon : lon };
}

/**
 * The application segments (APP0–APP15) of a JPEG before its image data, each with the identifier
 * its data starts with: "JFIF" (APP0), "Exif" and "http://ns.adobe.com/xap/1.0/" (XMP) in APP1,
 * "ICC_PROFILE" in APP2, "Photoshop 3.0" (IPTC) in APP13.
 */
export function jpegAppSegments(jpeg: Buffer): Array<{ app: number; id: string }> {
  if (jpeg[0] !== 0xff || jpeg[1] !== 0xd8) throw new Error("not a JPEG (no SOI marker)");
  const out: Array<{ app: number; id: string }> = [];
  let at = 2;
  while (at + 4 <= jpeg.length && jpeg[at] === 0xff) {
    const marker = jpeg[at + 1]!;
    if (marker === 0xda || marker === 0xd9) break;
    const length = jpeg.readUInt16BE(at + 2);
    if (marker >= 0xe0 && marker <= 0xef) {
      const data = jpeg.subarray(at + 4, at + 2 + length);
      const nul = data.indexOf(0);
      out.push({ app: marker - 0xe0, id: data.subarray(0, nul < 0 ? Math.min(32, data.length) : nul).toString("latin1") });
    }
    at += 2 + length;
  }
  return out;
}
