// npm run bench:photos — how long preparing one uploaded photo takes (content check, orientation,
// the stripped display version and the thumbnail, lib/photos/images.ts), in process. The upload
// waits for this inside the service's callback, so it must stay far below that wait
// (FAKE_UPLOADTHING_CALLBACK_TIMEOUT_MS locally). Prints numbers; never passes or fails.
import { cpus, loadavg } from "node:os";
import sharp from "sharp";
import { preparePhoto } from "../lib/photos/images";

const load = () => `load ${loadavg()[0]!.toFixed(2)} on ${cpus().length} cores`;
const RUNS = Number(process.env.BENCH_PHOTO_RUNS ?? 5);

/** A camera-like JPEG: smooth gradients with fine noise (harder to code than a flat test card). */
async function cameraJpeg(width: number, height: number): Promise<Buffer> {
  const raw = Buffer.alloc(width * height * 3);
  let s = 12345;
  for (let i = 0; i < raw.length; i++) {
    s = (s * 1103515245 + 12345) & 0x7fffffff;
    raw[i] = ((i % (width * 3)) / (width * 3)) * 220 + (s % 24);
  }
  return sharp(raw, { raw: { width, height, channels: 3 } }).jpeg({ quality: 90 }).withExif({ IFD0: { Make: "Bench" } }).toBuffer();
}

const pct = (xs: number[], p: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.ceil((p / 100) * xs.length) - 1)]!;

async function main() {
  console.log(`[bench:photos] ${RUNS} runs per size, sharp ${sharp.versions.sharp} / libvips ${sharp.versions.vips}; start: ${load()}`);
  for (const [w, h] of [
    [4000, 3000],
    [6000, 4000],
  ] as const) {
    const input = await cameraJpeg(w, h);
    await preparePhoto(input, "warm-up.jpg");
    const ms: number[] = [];
    let out = { full: 0, thumb: 0 };
    for (let i = 0; i < RUNS; i++) {
      const t = performance.now();
      const p = await preparePhoto(input, "bench.jpg");
      ms.push(performance.now() - t);
      out = { full: p.full.bytes.length, thumb: p.thumb.bytes.length };
    }
    console.log(
      `[bench:photos] ${w}×${h} JPEG (${(input.length / 1024 / 1024).toFixed(1)} MB): median ${pct(ms, 50).toFixed(0)} ms, p95 ${pct(ms, 95).toFixed(0)} ms; ` +
        `served ${(out.full / 1024).toFixed(0)} KB + thumbnail ${(out.thumb / 1024).toFixed(0)} KB (${load()})`,
    );
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
