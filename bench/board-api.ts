/**
 * Benchmark: the board API (GET /api/parks/{slug}/board, from the per-park cache) and the
 * rendered board page (/parks/{slug}) against a bare Node `http` + `pg` server running the same
 * SQL (lib/conditions/board-sql.ts) on every request, on the same database, in the same run.
 * Each server runs in its own process; autocannon runs here. Prints requests per second,
 * p99 latency and the ratio; asserts nothing.
 *
 * Run with the database up and the app built (`npm start` does both), e.g.
 *   npx tsx bench/board-api.ts --url http://localhost:3000      # against the running app
 *   npx tsx bench/board-api.ts                                  # starts `next start` itself on a free port
 * Options: --slug harrow-ridge --duration 10 --connections 10. DATABASE_URL as for the app.
 */
import type { ChildProcess } from "node:child_process";
import http from "node:http";
import autocannon from "autocannon";
import pg from "pg";
import { BOARD_SQL } from "@/lib/conditions/board-sql";
import { env } from "@/lib/server/env";
import { exitOnSignal, freePort, option as optionIn, spawnTracked, startNext, stopChild, waitFor } from "./lib/processes";
import { emitResult } from "./lib/result";

const args = process.argv.slice(2);
const option = (name: string, fallback: string) => optionIn(args, name, fallback);
const SLUG = option("slug", "harrow-ridge");
const DURATION = Number(option("duration", "10"));
const CONNECTIONS = Number(option("connections", "10"));

/** The bare server: one pool, the same SQL and parameters, rows straight to JSON. Runs in its own process. */
async function serveBare(port: number) {
  const pool = new pg.Pool({ connectionString: env().DATABASE_URL, max: 10 });
  const server = http.createServer(async (_req, res) => {
    try {
      const { rows } = await pool.query(BOARD_SQL, [SLUG, new Date().toISOString()]);
      res.writeHead(rows.length ? 200 : 404, { "content-type": "application/json" });
      res.end(JSON.stringify(rows));
    } catch (error) {
      res.writeHead(500).end(String(error));
    }
  });
  server.listen(port, "127.0.0.1");
}

async function startBareServer(): Promise<{ url: string; child: ChildProcess }> {
  const port = await freePort();
  const child = spawnTracked("node_modules/.bin/tsx", ["--conditions=react-server", "bench/board-api.ts", "--serve-bare", String(port), "--slug", SLUG], { stdio: "ignore", env: process.env });
  const url = `http://127.0.0.1:${port}/`;
  await waitFor(url);
  return { url, child };
}

async function measure(label: string, url: string) {
  await autocannon({ url, connections: 2, duration: 2 }); // warm-up
  const result = await autocannon({ url, connections: CONNECTIONS, duration: DURATION });
  const errors = result.errors + result.non2xx;
  console.log(`${label.padEnd(24)} ${result.requests.average.toFixed(0).padStart(7)} req/s   p99 ${String(result.latency.p99).padStart(5)} ms   errors ${errors}`);
  return result;
}

async function main() {
  if (args.includes("--serve-bare")) return serveBare(Number(option("serve-bare", "0")));
  exitOnSignal();
  const given = option("url", "");
  const next = given ? { base: given.replace(/\/$/, ""), child: null } : await startNext();
  const bare = await startBareServer();
  try {
    const trails = ((await (await fetch(`${next.base}/api/parks/${SLUG}/board`)).json()) as { trails?: unknown[] }).trails?.length ?? 0;
    console.log(`Board of "${SLUG}" (${trails} trails), ${CONNECTIONS} connections, ${DURATION} s each, on ${new Date().toISOString().slice(0, 10)}`);
    const bareResult = await measure("bare http + pg", bare.url);
    const nextResult = await measure("Next.js board API", `${next.base}/api/parks/${SLUG}/board`);
    const pageResult = await measure("Next.js board page", `${next.base}/parks/${SLUG}`);
    const ratio = nextResult.requests.average / bareResult.requests.average;
    console.log(`ratio (Next.js / bare): ${(ratio * 100).toFixed(0)} % of the bare server's throughput (budget ≥ 100 %); p99 ${nextResult.latency.p99} ms vs ${bareResult.latency.p99} ms (budget ≤ 1.5×)`);
    console.log(`board page (server-rendered HTML): ${((pageResult.requests.average / bareResult.requests.average) * 100).toFixed(0)} % of the bare server's throughput; p99 ${pageResult.latency.p99} ms`);
    const failures = [nextResult, bareResult, pageResult].reduce((n, r) => n + r.errors + r.non2xx, 0);
    if (failures > 0) throw new Error(`${failures} failed requests: the figures above do not measure the board`);
    emitResult([
      { benchmark: "board API vs bare Node http + pg: throughput", ours: nextResult.requests.average, bare: bareResult.requests.average, unit: "req/s" },
      { benchmark: "board API vs bare Node http + pg: p99 latency", ours: nextResult.latency.p99, bare: bareResult.latency.p99, unit: "ms" },
      { benchmark: "board page (HTML) vs bare Node http + pg: throughput", ours: pageResult.requests.average, bare: bareResult.requests.average, unit: "req/s" },
      { benchmark: "board page (HTML) vs bare Node http + pg: p99 latency", ours: pageResult.latency.p99, bare: bareResult.latency.p99, unit: "ms" },
    ]);
  } finally {
    await stopChild(bare.child);
    await stopChild(next.child);
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
