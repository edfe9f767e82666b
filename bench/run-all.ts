/**
 * `npm run bench [-- --quick]` (through scripts/bench.sh, which prepares a fresh database and the
 * build): starts `next start` on a free loopback port, runs every benchmark in bench/ one after
 * the other as a child process (each prints its own figures, plus a `BENCH_RESULT` line), then
 * prints one table of ratios measured in this run and stops everything it started.
 * --quick shortens every benchmark (fewer rounds, shorter load, fewer subscribers); --only a.ts,b.ts
 * runs just those.
 */
import type { ChildProcess } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { exitOnSignal, spawnTracked, startNext, stopChild, type Server } from "./lib/processes";
import { formatMarkdownTable, formatTextTable, parseResultLines, type BenchRow } from "./lib/result";

const QUICK = process.argv.includes("--quick");
/** `--only board-api.ts,map-cold.ts` runs just those (the table then holds just their rows). */
const ONLY = (() => {
  const i = process.argv.indexOf("--only");
  return i >= 0 ? new Set(process.argv[i + 1]?.split(",") ?? []) : null;
})();
const CHILD_TIMEOUT_MS = 15 * 60_000;

type Bench = { file: string; args: (base: string) => string[]; env?: Record<string, string> };

/** Every benchmark in bench/, in the order they run (lightest on the machine first). */
const BENCHES: Bench[] = [
  { file: "page-js.ts", args: (base) => ["--url", base, "--loads", QUICK ? "1" : "2"] },
  { file: "board-api.ts", args: (base) => ["--url", base, "--duration", QUICK ? "3" : "10"] },
  { file: "gpx-100k.ts", args: () => [QUICK ? "1" : "3"] },
  { file: "gpx-preview-http.ts", args: (base) => ["--url", base, "--runs", QUICK ? "1" : "3"] },
  { file: "map-idle.ts", args: () => [QUICK ? "2" : "5"] },
  { file: "map-cold.ts", args: (base) => ["--url", base, "--rounds", QUICK ? "1" : "3"] },
  { file: "hazard-photo.ts", args: (base) => ["--url", base, "--runs", QUICK ? "3" : "5"] },
  { file: "notices-fanout.ts", args: () => [], env: { BENCH_SUBSCRIBERS: QUICK ? "2000" : "10000" } },
];

/** A benchmark added to bench/ but not to the list above would silently go unmeasured. */
function checkEveryBenchListed() {
  const files = fs.readdirSync(path.join(process.cwd(), "bench")).filter((f) => f.endsWith(".ts") && f !== "run-all.ts");
  const missing = files.filter((f) => !BENCHES.some((b) => b.file === f));
  if (missing.length) throw new Error(`bench/run-all.ts does not run: ${missing.join(", ")}`);
}

function machine() {
  const model = /^model name\s*:\s*(.+)$/m.exec(fs.readFileSync("/proc/cpuinfo", "utf8"))?.[1] ?? os.cpus()[0]?.model ?? "unknown CPU";
  return { cores: os.availableParallelism(), model, node: process.version, memoryGb: Math.round(os.totalmem() / 2 ** 30) };
}
const loadAverage = () => os.loadavg().map((l) => l.toFixed(2)).join(", ");

let running: ChildProcess | null = null;

/** Runs one benchmark, echoing its output, and returns the rows of its BENCH_RESULT lines. */
function runBench(bench: Bench, base: string): Promise<BenchRow[]> {
  return new Promise((resolve, reject) => {
    const child = spawnTracked(path.join(process.cwd(), "node_modules/.bin/tsx"), ["--conditions=react-server", path.join("bench", bench.file), ...bench.args(base)], {
      stdio: ["ignore", "pipe", "inherit"],
      env: { ...process.env, ...bench.env, BENCH_JSON: "1" },
    });
    running = child;
    let output = "";
    child.stdout?.on("data", (chunk: Buffer) => {
      output += chunk.toString();
      process.stdout.write(chunk);
    });
    const timer = setTimeout(() => void stopChild(child), CHILD_TIMEOUT_MS);
    child.on("exit", (code, signal) => {
      clearTimeout(timer);
      running = null;
      if (code !== 0) return reject(new Error(`${bench.file} ended with ${signal ?? `status ${code}`}`));
      try {
        const rows = parseResultLines(output);
        if (rows.length === 0) throw new Error(`${bench.file} printed no BENCH_RESULT line`);
        resolve(rows);
      } catch (error) {
        reject(error);
      }
    });
  });
}

async function main() {
  checkEveryBenchListed();
  const m = machine();
  const started = new Date();
  const loadBefore = loadAverage();
  console.log(`Loamcast benchmarks${QUICK ? " (--quick)" : ""}: ${started.toISOString()}, ${m.cores} cores (${m.model}), ${m.memoryGb} GB, Node ${m.node}; load average ${loadBefore}`);
  let app: Server | null = null;
  const rows: BenchRow[] = [];
  const failed: string[] = [];
  const stopAll = async () => {
    await stopChild(running);
    await stopChild(app?.child);
  };
  exitOnSignal(); // the children are stopped by the exit hook in bench/lib/processes.ts
  try {
    app = await startNext();
    console.log(`next start on ${app.base}`);
    for (const bench of BENCHES.filter((b) => !ONLY || ONLY.has(b.file))) {
      console.log(`\n━━ ${bench.file}`);
      const t0 = performance.now();
      try {
        rows.push(...(await runBench(bench, app.base)));
      } catch (error) {
        failed.push(bench.file);
        console.error(`✗ ${error instanceof Error ? error.message : error}`);
      }
      console.log(`(${((performance.now() - t0) / 1000).toFixed(0)} s)`);
    }
  } finally {
    await stopAll();
  }

  const minutes = ((Date.now() - started.getTime()) / 60_000).toFixed(1);
  const header = `${started.toISOString().slice(0, 10)}, nproc ${m.cores}, CPU ${m.model}, ${m.memoryGb} GB RAM, Node ${m.node}${QUICK ? ", --quick" : ""}${ONLY ? `, only ${[...ONLY].join(", ")}` : ""}; load average ${loadBefore} before, ${loadAverage()} after; ${minutes} min`;
  console.log(`\nRatios measured in this run (ratio = ours ÷ bare), ${header}\n`);
  console.log(formatTextTable(rows));
  const reportDir = path.join(process.cwd(), ".local/bench");
  fs.mkdirSync(reportDir, { recursive: true });
  fs.writeFileSync(path.join(reportDir, "latest.md"), `${header}\n\n${formatMarkdownTable(rows)}\n`);
  console.log(`\n(Markdown copy in .local/bench/latest.md)`);
  if (failed.length) {
    console.error(`✗ failed: ${failed.join(", ")}`);
    process.exitCode = 1;
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
