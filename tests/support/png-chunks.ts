// Reads the chunk list of a PNG file by the published format (PNG, ISO/IEC 15948 / W3C PNG
// Specification §5: an 8-byte signature, then chunks of a 4-byte big-endian length, a 4-byte type,
// the data and a 4-byte CRC), so tests can check what a stored image carries besides its pixels.

export const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/** The chunk types in order, e.g. ["IHDR", "IDAT", "IEND"]; throws on anything that is not a PNG. */
export function pngChunkTypes(bytes: Buffer): string[] {
  if (!bytes.subarray(0, 8).equals(PNG_SIGNATURE)) throw new Error("not a PNG: signature missing");
  const types: string[] = [];
  let at = 8;
  while (at + 8 <= bytes.length) {
    const length = bytes.readUInt32BE(at);
    types.push(bytes.toString("latin1", at + 4, at + 8));
    at += 12 + length;
  }
  if (types.at(-1) !== "IEND") throw new Error("not a PNG: no IEND chunk at the end");
  return types;
}

/** Width and height from the IHDR chunk (§11.2.2: the first chunk, two 4-byte big-endian integers). */
export function pngSize(bytes: Buffer): { width: number; height: number } {
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}
