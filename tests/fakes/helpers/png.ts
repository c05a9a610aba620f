// Small real images for upload tests, made with sharp (so their bytes are a valid PNG).
import sharp from "sharp";

export async function makePng(width = 64, height = 48, seed = 1): Promise<Buffer> {
  const raw = Buffer.alloc(width * height * 3);
  for (let i = 0; i < raw.length; i++) raw[i] = (i * 31 + seed * 17) % 256;
  return sharp(raw, { raw: { width, height, channels: 3 } }).png().toBuffer();
}
