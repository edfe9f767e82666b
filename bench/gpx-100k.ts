/**
 * Benchmark: a 100,000-point GPX processed without a database (parse + validate + stats +
 * simplify + profile + features) against a bare xmldom parse of the same text.
 * Run: npx tsx bench/gpx-100k.ts [runs] (median of 3 runs by default). Prints figures; asserts
 * nothing (timings vary by machine).
 */
import v8 from "node:v8";
import vm from "node:vm";
import { DOMParser } from "@xmldom/xmldom";
import { computeTrailStats, elevationProfile, parseTrailFile, processTrailUpload, simplifyLine, snapFeatures, toGpx } from "@/lib/trails/pure";
import { METRES_PER_DEGREE } from "@/lib/trails/pure/limits";
import { seededRandom } from "@/scripts/demo/synthetic-trails";
import type { Position, TrailWaypoint } from "@/lib/trails/pure/types";
import { emitResult } from "./lib/result";

const POINTS = 100_000;
const PARK = { lon: -121.94, lat: 47.3 };
const RUNS = Number(process.argv[2] ?? 3);

/** Laps of a 1.5 km-radius loop round the (fictional) demo park, a point every ~5 m, rolling elevation with jitter. */
function syntheticRecording(): { segments: Position[][]; waypoints: TrailWaypoint[] } {
  const random = seededRandom(2024);
  const radiusM = 1500;
  const stepRad = 5 / radiusM;
  const cosLat = Math.cos((PARK.lat * Math.PI) / 180);
  const line: Position[] = [];
  for (let i = 0; i < POINTS; i++) {
    const a = i * stepRad;
    const lon = PARK.lon + (radiusM * Math.cos(a)) / (cosLat * METRES_PER_DEGREE);
    const lat = PARK.lat + (radiusM * Math.sin(a)) / METRES_PER_DEGREE;
    const ele = 900 + 120 * Math.sin(a) + 4 * Math.sin(a * 40) + (random() - 0.5);
    line.push([+lon.toFixed(7), +lat.toFixed(7), +ele.toFixed(1)]);
  }
  const waypoints = Array.from({ length: 20 }, (_, k) => {
    const [lon, lat] = line[k * 4000];
    return { name: `Feature ${k}`, type: ["berm", "jump", "drop", "roots"][k % 4], lon, lat };
  });
  return { segments: [line], waypoints };
}

// A full collection before each timed run, so no phase pays for the previous one's garbage
// (a 7 MB document's DOM is hundreds of MB). The flag is set here so `tsx` runs it as it is.
v8.setFlagsFromString("--expose-gc");
const collectGarbage = vm.runInNewContext("gc") as () => void;

function time<T>(label: string, fn: () => T, runs = RUNS): { result: T; medianMs: number } {
  const times: number[] = [];
  let result!: T;
  for (let r = 0; r < runs; r++) {
    result = undefined as T;
    collectGarbage();
    const start = performance.now();
    result = fn();
    times.push(performance.now() - start);
  }
  const medianMs = times.sort((a, b) => a - b)[Math.floor(runs / 2)];
  const rssMb = process.memoryUsage().rss / 2 ** 20;
  console.log(`${label.padEnd(44)} median ${medianMs.toFixed(0).padStart(6)} ms  (runs: ${times.map((t) => t.toFixed(0)).join(", ")})  rss ${rssMb.toFixed(0)} MB`);
  return { result, medianMs };
}

const recording = syntheticRecording();
const text = toGpx({ name: "Bench laps", ...recording });
const bytes = Buffer.from(text);
console.log(`GPX: ${POINTS.toLocaleString("en-US")} track points + ${recording.waypoints.length} waypoints, ${(bytes.length / 2 ** 20).toFixed(1)} MB; Node ${process.version}`);

// Results are dropped between phases so one phase's garbage does not slow the next. One untimed
// parse first, so the first timed phase does not alone pay for xmldom's code being compiled.
new DOMParser({ onError: () => {} }).parseFromString(text, "text/xml");
const bare = time("bare xmldom parseFromString", () => void new DOMParser({ onError: () => {} }).parseFromString(text, "text/xml"));
const parsed = time("parseTrailFile (decode, checks, xmldom, togeojson)", () => parseTrailFile({ bytes, filename: "bench.gpx", parkCenter: PARK })).result;
time("computeTrailStats", () => computeTrailStats(parsed.segments));
time("simplifyLine (2 m)", () => simplifyLine(parsed.segments));
time("elevationProfile (300 points)", () => elevationProfile(parsed.segments));
time("snapFeatures (20 waypoints)", () => snapFeatures(parsed.waypoints, parsed.segments));
const full = time("processTrailUpload (all of the above)", () => processTrailUpload({ bytes, filename: "bench.gpx", parkCenter: PARK }));

const s = full.result.stats;
console.log(`full / bare xmldom: ${(full.medianMs / bare.medianMs).toFixed(1)}×`);
console.log(`result: ${(s.lengthM / 1000).toFixed(1)} km, ascent ${s.ascentM?.toFixed(0)} m, simplified to ${JSON.stringify(full.result.simplified.coordinates).length.toLocaleString("en-US")} bytes of coordinates`);
emitResult([{ benchmark: "100,000-point GPX: whole upload processing vs bare xmldom parse", ours: full.medianMs, bare: bare.medianMs, unit: "ms" }]);
console.log(`peak memory: rss now ${(process.memoryUsage().rss / 2 ** 20).toFixed(0)} MB, max rss ${(process.resourceUsage().maxRSS / 1024).toFixed(0)} MB`);
