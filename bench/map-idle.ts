/**
 * Benchmark: time for the park map to reach MapLibre's `idle` with 300 trails against 10, in the
 * same run, same browser and same style (lib/map/pure/style.ts). A small local server serves the
 * MapLibre bundle from node_modules, our font, the style and synthetic trails (lib/trails/synthetic,
 * invented lines) on the same paths the app uses; Chromium (/usr/bin/chromium, SwiftShader WebGL)
 * drives it through playwright-core. Prints figures; asserts nothing.
 * Run: npx tsx bench/map-idle.ts [rounds]
 */
import { readFileSync } from "node:fs";
import { createServer, type Server } from "node:http";
import os from "node:os";
import path from "node:path";
import { chromium } from "playwright-core";
import { trailBounds } from "@/lib/map/pure/bounds";
import { trailsCollection, type TodayReport, type TrailRowForMap } from "@/lib/map/pure/geojson";
import { parkLayersCollection } from "@/lib/map/pure/park-layers";
import { buildParkStyle } from "@/lib/map/pure/style";
import { trailLabelPoints } from "@/lib/map/pure/trail-labels";
import { simplifyLine } from "@/lib/trails/pure";
import { seededRandom, synthesizeTrail } from "@/scripts/demo/synthetic-trails";
import { difficultyValues } from "@/lib/trails/pure/schemas";
import { emitResult } from "./lib/result";

const COUNTS = [10, 300];
const ROUNDS = Number(process.argv[2] ?? 5);
const CENTRE = { lon: -121.94, lat: 47.3 };
const ROOT = process.cwd();
const demoPark = JSON.parse(readFileSync(path.join(ROOT, "data/demo-park/park.json"), "utf8"));
const baseLayers = parkLayersCollection({
  ...demoPark.mapLayers,
  contours: JSON.parse(readFileSync(path.join(ROOT, "data/demo-park/contours.geojson"), "utf8")),
  roads: JSON.parse(readFileSync(path.join(ROOT, "data/demo-park/roads.geojson"), "utf8")),
});

/** N invented trails spread over a 6 km square, every difficulty and status, simplified as the app stores them. */
function syntheticPark(count: number) {
  const random = seededRandom(9000 + count);
  const rows: Array<TrailRowForMap & { minLon: number; minLat: number; maxLon: number; maxLat: number }> = [];
  const today = new Map<string, TodayReport>();
  const statuses = ["open", "caution", "closed", null] as const;
  for (let i = 0; i < count; i++) {
    const jitter = (deg: number) => (random() - 0.5) * deg;
    const start: [number, number] = [CENTRE.lon + jitter(0.07), CENTRE.lat + jitter(0.05)];
    const end: [number, number] = [start[0] + jitter(0.03), start[1] + jitter(0.02)];
    const line = synthesizeTrail({ seed: i + 1, start, end, startEleM: 1300, endEleM: 700, lengthM: 2000 + random() * 3000, bulgeM: jitter(600), meanderM: 60 + random() * 80, spacingM: 7, gradeVariation: 0.4, rollerM: 1, rollerWavelengthM: 60, noiseM: 0.3 });
    const lons = line.map((p) => p[0]);
    const lats = line.map((p) => p[1]);
    const id = `bench-${count}-${i}`;
    rows.push({
      id,
      name: `Bench line ${i + 1}`,
      difficulty: difficultyValues[i % difficultyValues.length],
      kind: "flow",
      direction: "downhill",
      lengthM: 0,
      descentM: 600,
      maxGradePct: 20,
      simplified: simplifyLine([line]),
      minLon: Math.min(...lons),
      minLat: Math.min(...lats),
      maxLon: Math.max(...lons),
      maxLat: Math.max(...lats),
    });
    const status = statuses[i % statuses.length];
    if (status) today.set(id, { status, surfaces: ["dry"] });
  }
  const trails = trailsCollection(rows, today, new Map());
  return { trails, labels: trailLabelPoints(trails), bounds: trailBounds(rows)! };
}

function serve(parks: Map<string, ReturnType<typeof syntheticPark>>): Promise<Server> {
  const files: Record<string, [string, string]> = {
    "/maplibre-gl.mjs": ["node_modules/maplibre-gl/dist/maplibre-gl.mjs", "text/javascript"],
    "/maplibre-gl-worker.mjs": ["node_modules/maplibre-gl/dist/maplibre-gl-worker.mjs", "text/javascript"],
    "/maplibre-gl.css": ["node_modules/maplibre-gl/dist/maplibre-gl.css", "text/css"],
    "/map/fonts/inter-latin-var.woff2": ["public/map/fonts/inter-latin-var.woff2", "font/woff2"],
  };
  const empty = { type: "FeatureCollection", features: [] };
  const server = createServer((request, response) => {
    const url = new URL(request.url ?? "/", "http://localhost");
    const send = (type: string, body: string | Buffer) => response.writeHead(200, { "content-type": type }).end(body);
    if (files[url.pathname]) return send(files[url.pathname][1], readFileSync(path.join(ROOT, files[url.pathname][0])));
    const page = /^\/bench\/(\d+)$/.exec(url.pathname);
    if (page) {
      const slug = `bench-${page[1]}`;
      const bounds = JSON.stringify(parks.get(slug)!.bounds);
      return send("text/html", `<!doctype html><link rel="stylesheet" href="/maplibre-gl.css"><div id="map" style="width:412px;height:640px"></div>
<script type="module">
import * as maplibregl from "/maplibre-gl.mjs";
maplibregl.setWorkerUrl("/maplibre-gl-worker.mjs");
const start = performance.now();
const map = new maplibregl.Map({ container: "map", style: "/api/parks/${slug}/map-style.json", bounds: ${bounds}, fitBoundsOptions: { padding: 28 } });
map.once("idle", () => { window.__idle = { createdToIdleMs: performance.now() - start, navigationToIdleMs: performance.now() }; });
map.on("error", (e) => { window.__error = String(e.error?.message ?? e); });
</script>`);
    }
    const api = /^\/api\/parks\/([a-z0-9-]+)\/([a-z-]+)\.(geojson|json)$/.exec(url.pathname);
    const park = api && parks.get(api[1]);
    if (api && park) {
      const body = { "map-style": buildParkStyle({ parkSlug: api[1], parkName: api[1], center: [CENTRE.lon, CENTRE.lat] }), trails: park.trails, "trail-labels": park.labels, "park-layers": baseLayers, hazards: empty, features: empty }[api[2]];
      if (body) return send(api[3] === "json" ? "application/json" : "application/geo+json", JSON.stringify(body));
    }
    response.writeHead(404).end();
  });
  return new Promise((resolve) => server.listen(0, "127.0.0.1", () => resolve(server)));
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function main() {
  const parks = new Map(COUNTS.map((n) => [`bench-${n}`, syntheticPark(n)]));
  const server = await serve(parks);
  const port = (server.address() as { port: number }).port;
  const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking"] });
  const results = new Map<number, { created: number[]; navigation: number[] }>(COUNTS.map((n) => [n, { created: [], navigation: [] }]));
  try {
    for (let round = 0; round < ROUNDS; round++) {
      // Alternate the order so neither size always runs on a warmer machine.
      for (const n of round % 2 ? [...COUNTS].reverse() : COUNTS) {
        const context = await browser.newContext({ viewport: { width: 412, height: 700 } });
        const page = await context.newPage();
        await page.goto(`http://127.0.0.1:${port}/bench/${n}`);
        await page.waitForFunction(() => (window as unknown as { __idle?: unknown; __error?: unknown }).__idle || (window as unknown as { __error?: unknown }).__error, null, { timeout: 120_000 });
        const { idle, error } = await page.evaluate(() => ({ idle: (window as unknown as { __idle?: { createdToIdleMs: number; navigationToIdleMs: number } }).__idle, error: (window as unknown as { __error?: string }).__error }));
        if (!idle) throw new Error(`map error with ${n} trails: ${error}`);
        results.get(n)!.created.push(idle.createdToIdleMs);
        results.get(n)!.navigation.push(idle.navigationToIdleMs);
        await context.close();
      }
    }
  } finally {
    await browser.close();
    server.close();
  }
  const cpu = os.cpus();
  console.log(`map-idle benchmark, ${new Date().toISOString().slice(0, 10)}, ${cpu.length} × ${cpu[0]?.model ?? "cpu"}, Node ${process.version}, Chromium (SwiftShader), ${ROUNDS} rounds`);
  for (const n of COUNTS) {
    const r = results.get(n)!;
    const points = parks.get(`bench-${n}`)!.trails.features.reduce((sum, f) => sum + JSON.stringify(f.geometry.coordinates).split("],[").length, 0);
    console.log(`${String(n).padStart(4)} trails (${points} points): map created → idle median ${median(r.created).toFixed(0)} ms (${r.created.map((x) => x.toFixed(0)).join(", ")}); page start → idle median ${median(r.navigation).toFixed(0)} ms`);
  }
  const [small, large] = COUNTS.map((n) => median(results.get(n)!.created));
  console.log(`ratio ${COUNTS[1]} / ${COUNTS[0]} trails (map created → idle): ${(large / small).toFixed(2)}×`);
  emitResult([{ benchmark: `map idle: ${COUNTS[1]} trails vs ${COUNTS[0]} (map created → idle, median of ${ROUNDS})`, ours: large, bare: small, unit: "ms" }]);
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
