/**
 * Benchmark: a cold load of the park map page (/parks/{slug}/map) on the phone profile (412 × 915,
 * CPU slowed 4 × through the DevTools protocol, empty cache), against a bare page in the same run:
 * plain HTML that creates MapLibre (from node_modules) with the same style, GeoJSON and font,
 * fetched once from the app and served by a bare Node server. Figures, each from navigation start
 * (medians): Largest Contentful Paint, the first frame with a trail line drawn, and MapLibre's idle.
 * Chromium (/usr/bin/chromium, SwiftShader WebGL) through playwright-core. Prints figures; asserts nothing.
 *
 *   npx tsx bench/map-cold.ts                               # starts `next start` itself on a free port
 *   npx tsx bench/map-cold.ts --url http://localhost:3000   # or measures a running app
 * Options: --slug harrow-ridge --rounds 3 --cpu 4.
 */
import { readFileSync } from "node:fs";
import { createServer, type Server } from "node:http";
import os from "node:os";
import path from "node:path";
import { bbox } from "@turf/turf";
import { chromium, type Browser } from "playwright-core";
import { TRAIL_LINE_LAYER_IDS } from "@/lib/map/pure/layer-ids";
import { parkDataUrls } from "@/lib/map/pure/sources";
import { exitOnSignal, option as optionIn, startNext, stopChild } from "./lib/processes";
import { emitResult } from "./lib/result";

const args = process.argv.slice(2);
const option = (name: string, fallback: string) => optionIn(args, name, fallback);
const SLUG = option("slug", "harrow-ridge");
const ROUNDS = Number(option("rounds", "3"));
const CPU_SLOWDOWN = Number(option("cpu", "4"));
const ROOT = process.cwd();

type Timings = { lcpMs: number; firstTrailMs: number; idleMs: number; bytes: number };

/**
 * Runs in the page before its own scripts: records LCP, and on every animation frame asks the map
 * (window.__loamcastMap in the app, set on MapLibre's load; window.__map on the bare page) whether a
 * trail line is on screen yet, then waits for idle. Plain JavaScript text: a function handed to
 * playwright would carry tsx's name helpers into the page.
 */
const probe = (trailLayers: readonly string[]) => `(() => {
  const trailLayers = ${JSON.stringify(trailLayers)};
  const marks = { lcpMs: 0, firstTrailMs: 0, idleMs: 0 };
  window.__marks = marks;
  new PerformanceObserver((list) => { for (const entry of list.getEntries()) marks.lcpMs = entry.startTime; })
    .observe({ type: "largest-contentful-paint", buffered: true });
  let hooked = false;
  const check = () => {
    const map = window.__loamcastMap || window.__map;
    if (!map || marks.firstTrailMs) return;
    const layers = trailLayers.filter((id) => map.getLayer(id));
    if (layers.length && map.queryRenderedFeatures({ layers }).length) marks.firstTrailMs = performance.now();
    if (!hooked) {
      hooked = true;
      const idle = () => { marks.idleMs = performance.now(); };
      if (map.loaded()) idle(); else map.once("idle", idle);
    }
  };
  const tick = () => {
    try { check(); } catch (error) { marks.error = String(error); }
    if (!marks.firstTrailMs || !marks.idleMs) requestAnimationFrame(tick);
  };
  requestAnimationFrame(tick);
})();`;

/** The bare page's files: MapLibre from node_modules, the style and data as the app answered them. */
async function bareServer(appBase: string): Promise<Server> {
  const urls = parkDataUrls(SLUG);
  const captured = new Map<string, [string, Buffer]>();
  for (const url of Object.values(urls)) {
    const response = await fetch(appBase + url);
    if (!response.ok) throw new Error(`${url} answered ${response.status}`);
    captured.set(url, [response.headers.get("content-type") ?? "application/json", Buffer.from(await response.arrayBuffer())]);
  }
  const files: Record<string, [string, string]> = {
    "/maplibre-gl.mjs": ["node_modules/maplibre-gl/dist/maplibre-gl.mjs", "text/javascript"],
    "/maplibre-gl-worker.mjs": ["node_modules/maplibre-gl/dist/maplibre-gl-worker.mjs", "text/javascript"],
    "/maplibre-gl.css": ["node_modules/maplibre-gl/dist/maplibre-gl.css", "text/css"],
    "/map/fonts/inter-latin-var.woff2": ["public/map/fonts/inter-latin-var.woff2", "font/woff2"],
  };
  // Opened on the trails, as the app opens (padding 28, lib/map/pure/bounds.ts).
  const [west, south, east, north] = bbox(JSON.parse(captured.get(urls.trails)![1].toString()));
  const page = `<!doctype html><meta name="viewport" content="width=device-width"><link rel="stylesheet" href="/maplibre-gl.css">
<h1>Map</h1><div id="map" style="width:100%;height:62vh"></div>
<script type="module">
import * as maplibregl from "/maplibre-gl.mjs";
maplibregl.setWorkerUrl("/maplibre-gl-worker.mjs");
const map = new maplibregl.Map({ container: "map", style: ${JSON.stringify(urls.style)}, bounds: ${JSON.stringify([[west, south], [east, north]])}, fitBoundsOptions: { padding: 28 } });
map.once("load", () => { window.__map = map; });
</script>`;
  const server = createServer((request, response) => {
    const pathname = new URL(request.url ?? "/", "http://localhost").pathname;
    const send = (type: string, body: string | Buffer) => response.writeHead(200, { "content-type": type }).end(body);
    if (pathname === "/") return send("text/html", page);
    if (files[pathname]) return send(files[pathname][1], readFileSync(path.join(ROOT, files[pathname][0])));
    const data = captured.get(pathname);
    if (data) return send(data[0], data[1]);
    response.writeHead(404).end();
  });
  return new Promise((resolve) => server.listen(0, "127.0.0.1", () => resolve(server)));
}

/** One cold load in a fresh context (no cache, no service worker yet) with the CPU slowed. */
async function coldLoad(browser: Browser, url: string): Promise<Timings> {
  const context = await browser.newContext({ viewport: { width: 412, height: 915 }, deviceScaleFactor: 1, isMobile: true, hasTouch: true });
  try {
    const page = await context.newPage();
    let bytes = 0;
    page.on("requestfinished", (request) => void request.sizes().then((s) => (bytes += s.responseBodySize + s.responseHeadersSize), () => {}));
    const cdp = await context.newCDPSession(page);
    await cdp.send("Emulation.setCPUThrottlingRate", { rate: CPU_SLOWDOWN });
    await page.addInitScript({ content: probe(TRAIL_LINE_LAYER_IDS) });
    const response = await page.goto(url, { waitUntil: "load" });
    if (!response?.ok()) throw new Error(`${url} answered ${response?.status()}`);
    await page
      .waitForFunction(() => {
        const m = (window as unknown as { __marks: { firstTrailMs: number; idleMs: number } }).__marks;
        return m.firstTrailMs > 0 && m.idleMs > 0;
      }, null, { timeout: 120_000, polling: 200 })
      .catch(async (error) => {
        throw new Error(`${url}: ${error}; marks ${JSON.stringify(await page.evaluate(() => (window as unknown as { __marks: unknown }).__marks))}`);
      });
    const marks = await page.evaluate(() => (window as unknown as { __marks: Omit<Timings, "bytes"> }).__marks);
    return { ...marks, bytes };
  } finally {
    await context.close();
  }
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const load = () => os.loadavg()[0].toFixed(2);

async function main() {
  exitOnSignal();
  const given = option("url", "");
  const next = given ? { base: given.replace(/\/$/, ""), child: null } : await startNext();
  const bare = await bareServer(next.base);
  const bareBase = `http://127.0.0.1:${(bare.address() as { port: number }).port}/`;
  const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking"] });
  const runs: Record<"ours" | "bare", Timings[]> = { ours: [], bare: [] };
  const loadBefore = load();
  try {
    for (let round = 0; round < ROUNDS; round++) {
      // Alternate the order so neither page always runs on a warmer machine.
      const order = round % 2 ? (["bare", "ours"] as const) : (["ours", "bare"] as const);
      for (const which of order) runs[which].push(await coldLoad(browser, which === "ours" ? `${next.base}/parks/${SLUG}/map` : bareBase));
    }
  } finally {
    await browser.close();
    bare.close();
    await stopChild(next.child);
  }
  const figure = (which: "ours" | "bare", key: keyof Timings) => median(runs[which].map((r) => r[key]));
  console.log(`map cold load of "${SLUG}", phone 412 × 915, CPU ÷${CPU_SLOWDOWN}, ${ROUNDS} rounds, ${new Date().toISOString()}, ${os.cpus().length} cores; load average ${loadBefore} before, ${load()} after`);
  for (const key of ["lcpMs", "firstTrailMs", "idleMs", "bytes"] as const) {
    const unit = key === "bytes" ? "B" : "ms";
    console.log(`  ${key.padEnd(13)} ours median ${figure("ours", key).toFixed(0).padStart(8)} ${unit} (${runs.ours.map((r) => r[key].toFixed(0)).join(", ")})   bare median ${figure("bare", key).toFixed(0).padStart(8)} ${unit} (${runs.bare.map((r) => r[key].toFixed(0)).join(", ")})`);
  }
  emitResult([
    { benchmark: `map cold load, phone, CPU ÷${CPU_SLOWDOWN}: Largest Contentful Paint vs bare MapLibre page`, ours: figure("ours", "lcpMs"), bare: figure("bare", "lcpMs"), unit: "ms" },
    { benchmark: `map cold load, phone, CPU ÷${CPU_SLOWDOWN}: first trail drawn vs bare MapLibre page`, ours: figure("ours", "firstTrailMs"), bare: figure("bare", "firstTrailMs"), unit: "ms" },
    { benchmark: `map cold load, phone, CPU ÷${CPU_SLOWDOWN}: map idle vs bare MapLibre page`, ours: figure("ours", "idleMs"), bare: figure("bare", "idleMs"), unit: "ms" },
    { benchmark: "map cold load: bytes transferred vs bare MapLibre page", ours: figure("ours", "bytes") / 1024, bare: figure("bare", "bytes") / 1024, unit: "kB" },
  ]);
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
