/**
 * Benchmark: a 100,000-point GPX processed without a database (parse + validate + stats +
 * simplify + profile + features) against a bare streaming pass of saxes (the parser we use, same
 * options, no handlers) over the same text, in the same run: time (median of 3 runs by default)
 * and peak resident-memory growth, each measured in a fresh child process so neither inherits the
 * other's heap. Run: npx tsx bench/gpx-100k.ts [runs]. Prints figures; asserts nothing.
 */
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import v8 from "node:v8";
import vm from "node:vm";
import { computeTrailStats, elevationProfile, parseTrailFile, processTrailUpload, simplifyLine, snapFeatures, toGpx } from "@/lib/trails/pure";
import { bareSaxesPass, PARK, syntheticRecording } from "./lib/gpx-file";
import { emitResult } from "./lib/result";

const POINTS = 100_000;
const RUNS = Number(process.argv[2] ?? 3);
const FILE = path.join(process.cwd(), ".local/bench/gpx-100k.gpx");

// A full collection before each timed run, so no phase pays for the previous one's garbage.
// The flag is set here so `tsx` runs it as it is.
v8.setFlagsFromString("--expose-gc");
const collectGarbage = vm.runInNewContext("gc") as () => void;

const ours = (bytes: Buffer) => processTrailUpload({ bytes, filename: "bench.gpx", parkCenter: PARK });

/** Child mode: one run of `which` over the file; prints resident-memory growth (peak − before) in bytes. */
function memoryChild(which: string) {
  const bytes = fs.readFileSync(FILE);
  const text = which === "bare" ? bytes.toString("utf8") : "";
  collectGarbage();
  const before = process.memoryUsage().rss;
  if (which === "bare") bareSaxesPass(text);
  else ours(bytes);
  console.log(JSON.stringify({ growth: process.resourceUsage().maxRSS * 1024 - before }));
}

function memoryGrowth(which: "ours" | "bare"): number {
  const child = spawnSync(path.join(process.cwd(), "node_modules/.bin/tsx"), ["--conditions=react-server", "bench/gpx-100k.ts", "--memory", which], { encoding: "utf8" });
  if (child.status !== 0) throw new Error(`memory child (${which}) failed: ${child.stderr}`);
  return (JSON.parse(child.stdout.trim().split("\n").pop()!) as { growth: number }).growth;
}

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
  console.log(`${label.padEnd(44)} median ${medianMs.toFixed(0).padStart(6)} ms  (runs: ${times.map((t) => t.toFixed(0)).join(", ")})`);
  return { result, medianMs };
}

function main() {
  const recording = syntheticRecording(POINTS);
  const text = toGpx({ name: "Bench laps", ...recording });
  const bytes = Buffer.from(text);
  fs.mkdirSync(path.dirname(FILE), { recursive: true });
  fs.writeFileSync(FILE, bytes);
  const mb = bytes.length / 2 ** 20;
  console.log(`GPX: ${POINTS.toLocaleString("en-US")} track points + ${recording.waypoints.length} waypoints, ${mb.toFixed(1)} MB; Node ${process.version}`);

  // One untimed pass of each first, so the first timed phase does not alone pay for compilation.
  bareSaxesPass(text);
  ours(bytes);
  const bare = time("bare saxes pass (xmlns, no handlers)", () => bareSaxesPass(text));
  const parsed = time("parseTrailFile (decode, checks, stream)", () => parseTrailFile({ bytes, filename: "bench.gpx", parkCenter: PARK })).result;
  time("computeTrailStats", () => computeTrailStats(parsed.segments));
  time("simplifyLine (2 m)", () => simplifyLine(parsed.segments));
  time("elevationProfile (300 points)", () => elevationProfile(parsed.segments));
  time("snapFeatures (20 waypoints)", () => snapFeatures(parsed.waypoints, parsed.segments));
  const full = time("processTrailUpload (all of the above)", () => ours(bytes));

  const s = full.result.stats;
  console.log(`time: processTrailUpload / bare saxes pass = ${(full.medianMs / bare.medianMs).toFixed(2)}× (budget ≤ 2×)`);
  console.log(`result: ${(s.lengthM / 1000).toFixed(1)} km, ascent ${s.ascentM?.toFixed(0)} m, simplified to ${JSON.stringify(full.result.simplified.coordinates).length.toLocaleString("en-US")} bytes of coordinates`);
  const oursGrowth = memoryGrowth("ours");
  const bareGrowth = memoryGrowth("bare");
  const toMb = (b: number) => b / 2 ** 20;
  console.log(`peak resident growth: ours ${toMb(oursGrowth).toFixed(0)} MB = ${(oursGrowth / bytes.length).toFixed(1)}× the file (budget ≤ 10×); bare saxes ${toMb(bareGrowth).toFixed(0)} MB = ${(bareGrowth / bytes.length).toFixed(1)}×`);
  emitResult([
    { benchmark: "100,000-point GPX: whole upload processing vs bare saxes pass: time", ours: full.medianMs, bare: bare.medianMs, unit: "ms" },
    { benchmark: "100,000-point GPX: peak resident growth vs bare saxes pass", ours: toMb(oursGrowth), bare: toMb(bareGrowth), unit: "MB" },
  ]);
}

const memoryAt = process.argv.indexOf("--memory");
if (memoryAt >= 0) memoryChild(process.argv[memoryAt + 1]);
else main();
