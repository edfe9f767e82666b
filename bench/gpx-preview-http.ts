/**
 * Benchmark: a 190,000-point GPX (about 14 MB) previewed through HTTP — a signed-in manager's
 * multipart POST /api/parks/{slug}/trails/preview until its 200 — against a bare saxes pass over
 * the same text (the parser we use, same options, no handlers) in the same run: time (median) and
 * peak resident-memory growth, the server's (its peak reset through /proc before the request) and
 * the bare pass's (in a fresh child process). One untimed preview first (the server's first loads
 * the route's modules), its time printed. Prints figures and the load average; asserts nothing.
 *
 *   npx tsx --conditions=react-server bench/gpx-preview-http.ts [--url http://localhost:3000] [--runs 3]
 */
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { toGpx } from "@/lib/trails/pure";
import { demoEmail, listeningPid, peakGrowthBytes, signedIn } from "./lib/app-session";
import { bareSaxesPass, syntheticRecording } from "./lib/gpx-file";
import { exitOnSignal, option as optionIn, startNext, stopChild } from "./lib/processes";
import { emitResult } from "./lib/result";

const args = process.argv.slice(2);
const option = (name: string, fallback: string) => optionIn(args, name, fallback);
const RUNS = Number(option("runs", "3"));
const SLUG = option("slug", "harrow-ridge");
const POINTS = 190_000;
const FILE = path.join(process.cwd(), ".local/bench/gpx-190k.gpx");

/** Child mode: one bare pass over the file; prints its peak resident growth in bytes. */
function bareMemoryChild() {
  const text = fs.readFileSync(FILE, "utf8");
  const before = process.memoryUsage().rss;
  bareSaxesPass(text);
  console.log(JSON.stringify({ growth: process.resourceUsage().maxRSS * 1024 - before }));
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function main() {
  exitOnSignal();
  const text = toGpx({ name: "Bench laps", ...syntheticRecording(POINTS) });
  const bytes = Buffer.from(text);
  fs.mkdirSync(path.dirname(FILE), { recursive: true });
  fs.writeFileSync(FILE, bytes);
  console.log(`GPX: ${POINTS.toLocaleString("en-US")} track points + 20 waypoints, ${(bytes.length / 2 ** 20).toFixed(1)} MB; load average ${os.loadavg().map((l) => l.toFixed(2)).join(", ")}`);
  const given = option("url", "");
  const next = given ? { base: given.replace(/\/$/, ""), child: null } : await startNext();
  try {
    const manager = await signedIn(next.base, demoEmail("manager"));
    const preview = async () => {
      const response = await manager.post(`/api/parks/${SLUG}/trails/preview`, { multipart: { file: { name: "bench-190k.gpx", mimeType: "application/gpx+xml", buffer: bytes } }, timeout: 300_000 });
      if (response.status() !== 200) throw new Error(`preview answered ${response.status()}: ${(await response.text()).slice(0, 300)}`);
    };
    // One untimed pass of each first, as bench/gpx-100k.ts does: the server's first preview also
    // loads the route's modules and compiles them, which a warm server never pays again. Printed.
    bareSaxesPass(text);
    let t = performance.now();
    await preview();
    const coldMs = performance.now() - t;
    const bareTimes: number[] = [];
    const httpTimes: number[] = [];
    for (let r = 0; r < RUNS; r++) {
      t = performance.now();
      bareSaxesPass(text);
      bareTimes.push(performance.now() - t);
      t = performance.now();
      await preview();
      httpTimes.push(performance.now() - t);
    }
    const pid = listeningPid(Number(new URL(next.base).port));
    const serverGrowth = pid ? await peakGrowthBytes(pid, preview) : NaN;
    await manager.dispose();
    const child = spawnSync(path.join(process.cwd(), "node_modules/.bin/tsx"), ["--conditions=react-server", "bench/gpx-preview-http.ts", "--bare-memory"], { encoding: "utf8" });
    const bareGrowth = child.status === 0 ? (JSON.parse(child.stdout.trim().split("\n").pop()!) as { growth: number }).growth : NaN;
    const [bare, http] = [median(bareTimes), median(httpTimes)];
    const mb = (b: number) => b / 2 ** 20;
    console.log(`bare saxes pass    median ${bare.toFixed(0).padStart(6)} ms (${bareTimes.map((x) => x.toFixed(0)).join(", ")})`);
    console.log(`preview over HTTP  median ${http.toFixed(0).padStart(6)} ms (${httpTimes.map((x) => x.toFixed(0)).join(", ")}); ratio ${(http / bare).toFixed(2)}× (budget ≤ 2×); the untimed first one ${coldMs.toFixed(0)} ms`);
    console.log(`peak resident growth: server ${mb(serverGrowth).toFixed(0)} MB = ${(serverGrowth / bytes.length).toFixed(1)}× the file (budget ≤ 10×); bare saxes ${mb(bareGrowth).toFixed(0)} MB; load average ${os.loadavg()[0].toFixed(2)}`);
    emitResult([
      { benchmark: "190,000-point GPX preview through HTTP vs bare saxes pass: time", ours: http, bare, unit: "ms" },
      ...(Number.isFinite(serverGrowth) && Number.isFinite(bareGrowth) ? [{ benchmark: "190,000-point GPX preview through HTTP vs bare saxes pass: peak resident growth", ours: mb(serverGrowth), bare: mb(bareGrowth), unit: "MB" }] : []),
    ]);
  } finally {
    await stopChild(next.child);
  }
}

if (args.includes("--bare-memory")) bareMemoryChild();
else
  main().catch((error) => {
    console.error(error);
    process.exit(1);
  });
