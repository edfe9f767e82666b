/**
 * Benchmark: a hazard submit with one 1 MB photo. In process, without a database: processPhoto
 * (sniff, metadata, re-encode to at most 2048 px, 320 px thumbnail). End to end through HTTP: a
 * signed-in ranger's multipart POST /api/parks/{slug}/hazards until its 201 (body read, photo
 * processed and stored, hazard written). Both against a bare sharp re-encode of the same photo
 * (same resize, same thumbnail, nothing else) in the same run. Prints figures (medians) and the
 * load average; asserts nothing. The hazards it pins stay in the benchmark's own database.
 *
 *   npx tsx --conditions=react-server bench/hazard-photo.ts                    # starts `next start` itself
 *   npx tsx --conditions=react-server bench/hazard-photo.ts --url http://localhost:3000
 * Options: --runs 5 --slug harrow-ridge.
 */
import os from "node:os";
import { processPhoto } from "@/lib/photos/process-photo";
import { demoEmail, signedIn } from "./lib/app-session";
import { bareReencode, onePhoto } from "./lib/photo";
import { exitOnSignal, option as optionIn, startNext, stopChild } from "./lib/processes";
import { emitResult } from "./lib/result";

const args = process.argv.slice(2);
const option = (name: string, fallback: string) => optionIn(args, name, fallback);
const RUNS = Number(option("runs", "5"));
const SLUG = option("slug", "harrow-ridge");
const CENTRE = { lon: -121.94, lat: 47.3 }; // the demo park's (data/demo-park/park.json)

async function median(label: string, fn: () => Promise<unknown>): Promise<number> {
  const times: number[] = [];
  for (let r = 0; r < RUNS; r++) {
    const start = performance.now();
    await fn();
    times.push(performance.now() - start);
  }
  const m = times.sort((a, b) => a - b)[Math.floor(RUNS / 2)];
  console.log(`${label.padEnd(52)} median ${m.toFixed(0).padStart(6)} ms  (runs: ${times.map((t) => t.toFixed(0)).join(", ")}; load ${os.loadavg()[0].toFixed(2)})`);
  return m;
}

async function main() {
  exitOnSignal();
  const photo = await onePhoto();
  console.log(`photo: ${(photo.length / 2 ** 20).toFixed(2)} MB JPEG, 3000 × 2000; load average ${os.loadavg().map((l) => l.toFixed(2)).join(", ")}`);
  const given = option("url", "");
  const next = given ? { base: given.replace(/\/$/, ""), child: null } : await startNext();
  try {
    await bareReencode(photo); // warm-up: sharp's first call loads libvips
    const bare = await median("bare sharp resize + thumbnail", () => bareReencode(photo));
    const ours = await median("processPhoto (in process, as the app does)", () => processPhoto({ bytes: photo, name: "bench.jpg" }));
    const ranger = await signedIn(next.base, demoEmail("ranger"));
    const submit = async () => {
      const response = await ranger.post(`/api/parks/${SLUG}/hazards`, {
        multipart: { kind: "other", note: "Benchmark photo", lon: String(CENTRE.lon), lat: String(CENTRE.lat), photos: { name: "bench.jpg", mimeType: "image/jpeg", buffer: photo } },
      });
      if (response.status() !== 201) throw new Error(`hazard submit answered ${response.status()}: ${await response.text()}`);
    };
    await submit(); // warm-up: the route's first call compiles and connects
    const http = await median("hazard submit through HTTP (201 received)", submit);
    await ranger.dispose();
    console.log(`ratio in process / bare: ${(ours / bare).toFixed(2)}; through HTTP / bare: ${(http / bare).toFixed(2)}; through HTTP ${http < 1000 ? "under" : "OVER"} the 1 s budget`);
    emitResult([
      { benchmark: "hazard photo, 1 MB JPEG: processPhoto vs bare sharp re-encode", ours, bare, unit: "ms" },
      { benchmark: "hazard submit with a 1 MB photo through HTTP vs bare sharp re-encode", ours: http, bare, unit: "ms" },
    ]);
  } finally {
    await stopChild(next.child);
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
