/**
 * Benchmark: where a hazard submit with one 1 MB photo spends its time, without a database.
 * Ours: processPhoto (sniff, metadata, re-encode to at most 2048 px with mozjpeg, 320 px thumbnail).
 * Bare: the same resize and thumbnail with sharp's default JPEG encoder, in the same run.
 * Run: npx tsx --conditions=react-server bench/hazard-photo.ts [runs] (median of 5 by default).
 * Prints figures; asserts nothing.
 */
import sharp from "sharp";
import { processPhoto } from "@/lib/photos/process-photo";
import { emitResult } from "./lib/result";

const RUNS = Number(process.argv[2] ?? 5);

/** A 3000 × 2000 photo-like JPEG (noise over a gradient) of about 1 MB. */
async function onePhoto(): Promise<Buffer> {
  const width = 3000;
  const height = 2000;
  const noise = Buffer.alloc(width * height * 3);
  let seed = 7;
  for (let i = 0; i < noise.length; i++) {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff;
    noise[i] = ((i / 3) % width) / 12 + (seed % 40);
  }
  for (let quality = 95; quality > 10; quality -= 5) {
    const jpeg = await sharp(noise, { raw: { width, height, channels: 3 } }).blur(1.2).jpeg({ quality }).toBuffer();
    if (jpeg.length <= 1.1 * 2 ** 20) return jpeg;
  }
  throw new Error("could not make a 1 MB photo");
}

async function median(label: string, fn: () => Promise<unknown>): Promise<number> {
  const times: number[] = [];
  for (let r = 0; r < RUNS; r++) {
    const start = performance.now();
    await fn();
    times.push(performance.now() - start);
  }
  const m = times.sort((a, b) => a - b)[Math.floor(RUNS / 2)];
  console.log(`${label.padEnd(48)} median ${m.toFixed(0).padStart(6)} ms  (runs: ${times.map((t) => t.toFixed(0)).join(", ")})`);
  return m;
}

async function main() {
  const photo = await onePhoto();
  console.log(`photo: ${(photo.length / 2 ** 20).toFixed(2)} MB JPEG, 3000 × 2000`);
  const fit = { width: 2048, height: 2048, fit: "inside" as const, withoutEnlargement: true };
  const thumbFit = { width: 320, height: 320, fit: "inside" as const };
  const ours = await median("processPhoto (mozjpeg, as the app does)", () => processPhoto({ bytes: photo, name: "bench.jpg" }));
  const bare = await median("bare sharp resize + thumbnail (default JPEG)", async () => {
    const full = await sharp(photo, { autoOrient: true }).resize(fit).jpeg({ quality: 82 }).toBuffer();
    await sharp(full).resize(thumbFit).jpeg({ quality: 75 }).toBuffer();
  });
  console.log(`ratio ours / bare: ${(ours / bare).toFixed(2)}`);
  emitResult([{ benchmark: "hazard photo, 1 MB JPEG", ours, bare, unit: "ms" }]);
}

void main();
