/**
 * Generates the FICTIONAL demo park "Harrow Ridge Bike Park": its trail files (half GPX 1.1, half
 * GeoJSON), park.json and trails.json under data/demo-park/. Everything here is invented.
 * Deterministic (seeded), so running it again gives the same files. Run: npx tsx scripts/generate-demo-trails.ts
 */
import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import { along, destination, length, lineString } from "@turf/turf";
import { toGeoJson } from "@/lib/trails/pure/export-geojson";
import { toGpx } from "@/lib/trails/pure/export-gpx";
import { tightTurns } from "@/lib/trails/pure/turns";
import { seededRandom } from "@/scripts/demo/synthetic-trails";
import { bowedLane, routeToAverage, type RouteSpec } from "@/scripts/demo/trail-router";
import { demoElevationModel, demoRoads } from "@/scripts/demo/map-layers";
import type { Position, TrailWaypoint } from "@/lib/trails/pure/types";
import type { Difficulty, TrailDirection, TrailKind } from "@/lib/trails/pure/schemas";

const OUT = path.join(process.cwd(), "data", "demo-park");
const CENTER = { lon: -121.94, lat: 47.3 };
const BASE = { lon: -121.928, lat: 47.291, ele: 620 };
const SUMMIT = { lon: -121.952, lat: 47.309, ele: 1340 };
const MEADOW = { lon: -121.9352, lat: 47.2964, ele: 820 }; // top of the beginners' tow

type Stop = typeof BASE;
type FeatureMark = [fraction: number, type: string, name: string];
type DemoTrail = {
  name: string;
  difficulty: Difficulty;
  kind: TrailKind;
  direction: TrailDirection;
  format: "gpx" | "geojson";
  from: Stop;
  to: Stop;
  /** Sideways bow of the lane, metres (positive to the left going from `from` to `to`): its place on the hill. */
  bulgeM: number;
  /** How the crew laid it: aimed grade, lane half-width, turn and bend radii, meander. */
  lay: Pick<RouteSpec, "gradeVariation" | "halfWidthM" | "turnRadiusM" | "bendRadiusM" | "meanderDeg" | "steepestPct"> & { averagePct: number };
  /** Features by rough fraction along the trail; a berm moves to the nearest turn, as crews build them. */
  features: FeatureMark[];
  /** Split the recording here (fraction) to show a GPS signal gap between two segments. */
  gapAt?: number;
};

const TRAILS: DemoTrail[] = [
  { name: "Mossback Ramble", difficulty: "easiest", kind: "flow", direction: "downhill", format: "gpx", from: MEADOW, to: BASE, bulgeM: 160,
    lay: { averagePct: 3.4, gradeVariation: 0.2, halfWidthM: 100, turnRadiusM: 8, bendRadiusM: 25, steepestPct: 8, meanderDeg: 18 }, features: [[0.3, "berm", "Fern Bend"], [0.7, "wooden feature", "Creek Bridge"]] },
  { name: "Cedar Skip", difficulty: "easy", kind: "flow", direction: "downhill", format: "geojson", from: MEADOW, to: BASE, bulgeM: -160,
    lay: { averagePct: 4, gradeVariation: 0.3, halfWidthM: 90, turnRadiusM: 7, bendRadiusM: 20, steepestPct: 12, meanderDeg: 22 }, features: [[0.25, "berm", "Cedar Curl"], [0.55, "jump", "Little Hop"], [0.8, "berm", "Last Lean"]] },
  { name: "Switchgrass Traverse", difficulty: "easy", kind: "cross-country", direction: "both", format: "gpx", from: SUMMIT, to: BASE, bulgeM: 800,
    lay: { averagePct: 4.4, gradeVariation: 0.3, halfWidthM: 140, turnRadiusM: 7, bendRadiusM: 25, steepestPct: 12, meanderDeg: 15 }, features: [[0.2, "roots", "Spruce Knuckles"], [0.6, "wooden feature", "Bog Boardwalk"]] },
  { name: "Tumblewire", difficulty: "intermediate", kind: "jump", direction: "downhill", format: "geojson", from: SUMMIT, to: BASE, bulgeM: 480,
    lay: { averagePct: 8, gradeVariation: 0.3, halfWidthM: 80, turnRadiusM: 6, bendRadiusM: 18, steepestPct: 22, meanderDeg: 20 },
    features: [[0.12, "jump", "Tabletop One"], [0.2, "berm", "Wire Turn"], [0.35, "jump", "Step-up Stack"], [0.5, "berm", "Big Swoop"], [0.68, "jump", "Hip to Hip"], [0.85, "drop", "Exit Ledge"]] },
  { name: "Slatebelt Flow", difficulty: "intermediate", kind: "flow", direction: "downhill", format: "gpx", from: SUMMIT, to: BASE, bulgeM: -480, gapAt: 0.58,
    lay: { averagePct: 8.5, gradeVariation: 0.35, halfWidthM: 80, turnRadiusM: 6, bendRadiusM: 18, steepestPct: 22, meanderDeg: 22 }, features: [[0.15, "berm", "Slate Wall"], [0.4, "berm", "Moss Corner"], [0.75, "jump", "Roller Kicker"]] },
  { name: "Long Haul Climb", difficulty: "intermediate", kind: "climb", direction: "uphill", format: "geojson", from: BASE, to: SUMMIT, bulgeM: 950,
    lay: { averagePct: 8, gradeVariation: 0.2, halfWidthM: 150, turnRadiusM: 6, bendRadiusM: 25, steepestPct: 12, meanderDeg: 12 }, features: [[0.45, "roots", "Root Stairs"], [0.8, "rock garden", "Talus Step"]] },
  { name: "Gnarlroot", difficulty: "difficult", kind: "technical", direction: "downhill", format: "gpx", from: SUMMIT, to: BASE, bulgeM: 250,
    lay: { averagePct: 13, gradeVariation: 0.35, halfWidthM: 35, turnRadiusM: 4.5, bendRadiusM: 12, steepestPct: 30, meanderDeg: 25 }, features: [[0.2, "roots", "Tangle"], [0.42, "rock garden", "Scatter"], [0.6, "drop", "Root Ledge"], [0.82, "roots", "Knotted Chute"]] },
  { name: "Basalt Chute", difficulty: "difficult", kind: "downhill", direction: "downhill", format: "geojson", from: SUMMIT, to: BASE, bulgeM: -250,
    lay: { averagePct: 14, gradeVariation: 0.3, halfWidthM: 35, turnRadiusM: 4.5, bendRadiusM: 12, steepestPct: 30, meanderDeg: 22 }, features: [[0.3, "drop", "Column Drop"], [0.5, "wooden feature", "Ladder Bridge"], [0.78, "rock garden", "Basalt Blocks"]] },
  { name: "Scree Stairs", difficulty: "extreme", kind: "technical", direction: "downhill", format: "gpx", from: SUMMIT, to: BASE, bulgeM: 90,
    lay: { averagePct: 22, gradeVariation: 0.3, halfWidthM: 25, turnRadiusM: 3.5, bendRadiusM: 10, steepestPct: 45, meanderDeg: 25 }, features: [[0.25, "rock garden", "Loose Stair"], [0.5, "drop", "Slab Drop"], [0.75, "rock garden", "Scree Fan"]] },
  { name: "Plumbline", difficulty: "extreme", kind: "downhill", direction: "downhill", format: "geojson", from: SUMMIT, to: BASE, bulgeM: -90,
    lay: { averagePct: 30, gradeVariation: 0.3, halfWidthM: 25, turnRadiusM: 3.5, bendRadiusM: 10, steepestPct: 45, meanderDeg: 20 }, features: [[0.3, "drop", "Plumb Drop"], [0.55, "jump", "Gap Line"], [0.8, "roots", "Finish Roots"]] },
];

const slug = (name: string) => name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "");
const point = (name: string, stop: Stop) => ({
  type: "Feature" as const,
  properties: { name, elevationM: stop.ele },
  geometry: { type: "Point" as const, coordinates: [stop.lon, stop.lat] },
});
const LANDMARKS = { type: "FeatureCollection" as const, features: [point("Summit", SUMMIT), point("Base area", BASE), point("Meadow (tow top)", MEADOW)] };
const terrain = demoElevationModel({ mapLayers: { landmarks: LANDMARKS } });

function buildTrail(trail: DemoTrail, seed: number) {
  const random = seededRandom(seed * 7919);
  const jitter = () => (random() - 0.5) * 0.0005; // trailheads a few tens of metres apart
  const from: [number, number] = [trail.from.lon + jitter(), trail.from.lat + jitter()];
  const to: [number, number] = [trail.to.lon + jitter(), trail.to.lat + jitter()];
  const { averagePct, ...lay } = trail.lay;
  return routeToAverage({ seed, lane: bowedLane(from, to, trail.bulgeM), direction: trail.direction === "uphill" ? "up" : "down", spacingM: 5, noiseM: 0.1, ...lay }, averagePct, terrain);
}

/**
 * Feature waypoints a few metres beside the line, as a crew's GPS would mark them. A berm sits at
 * the turn nearest its rough place (each turn used once): a berm is built where the trail turns.
 */
function featureWaypoints(line: Position[], marks: FeatureMark[], seed: number): TrailWaypoint[] {
  const random = seededRandom(seed * 104729);
  const feature = lineString(line);
  const lengthM = length(feature, { units: "meters" });
  const free = tightTurns(line, { minAngleDeg: 60 }).map((turn) => turn.atM);
  return marks.map(([fraction, type, name]) => {
    let atM = lengthM * fraction;
    if (type === "berm" && free.length > 0) {
      const nearest = free.reduce((best, t, i) => (Math.abs(t - atM) < Math.abs(free[best] - atM) ? i : best), 0);
      atM = free.splice(nearest, 1)[0];
    }
    const on = along(feature, atM, { units: "meters" });
    const beside = destination(on, 1 + random() * 3, random() * 360 - 180, { units: "meters" });
    const [lon, lat] = beside.geometry.coordinates;
    return { name, type, lon: round(lon, 7), lat: round(lat, 7) };
  });
}

const round = (x: number, digits: number) => Math.round(x * 10 ** digits) / 10 ** digits;

/** Drops a few points at `fraction` so the recording has two segments with a short gap between them. */
function splitAt(line: Position[], fraction: number): Position[][] {
  const cut = Math.round(line.length * fraction);
  return [line.slice(0, cut), line.slice(cut + 4)];
}

const liftLine = (name: string, from: Stop, to: Stop) => ({
  type: "Feature" as const,
  properties: { name, from: from === BASE ? "base" : "summit", verticalM: to.ele - from.ele },
  geometry: { type: "LineString" as const, coordinates: [[from.lon, from.lat], [to.lon, to.lat]] },
});

/** A boundary around every trail and road with a margin, as an RFC 7946 polygon (exterior ring counter-clockwise). */
function boundary(lines: Position[][]) {
  const margin = 0.004;
  const lons = lines.flat().map((p) => p[0]);
  const lats = lines.flat().map((p) => p[1]);
  const [w, e] = [Math.min(...lons) - margin, Math.max(...lons) + margin].map((x) => round(x, 5));
  const [s, n] = [Math.min(...lats) - margin, Math.max(...lats) + margin].map((x) => round(x, 5));
  return {
    type: "Feature" as const,
    properties: { name: "Harrow Ridge Bike Park boundary (fictional)" },
    geometry: { type: "Polygon" as const, coordinates: [[[w, s], [e, s], [e, n], [w, n], [w, s]]] },
  };
}

/** The service road to the summit lies inside the park; the public access road comes in from outside. */
const serviceRoad = () => demoRoads({ mapLayers: { landmarks: LANDMARKS } }).features.find((f) => f.properties?.kind === "service")!.geometry.coordinates;

function main(): void {
  mkdirSync(path.join(OUT, "trails"), { recursive: true });
  const index = [];
  const lines: Position[][] = [];
  for (const [i, trail] of TRAILS.entries()) {
    const seed = 1000 + i;
    const line = buildTrail(trail, seed);
    lines.push(line);
    const segments = trail.gapAt ? splitAt(line, trail.gapAt) : [line];
    const waypoints = featureWaypoints(line, trail.features, seed);
    const file = `${slug(trail.name)}.${trail.format}`;
    const exported = { name: trail.name, segments, waypoints };
    const body = trail.format === "gpx" ? toGpx(exported) : `${JSON.stringify(toGeoJson(exported))}\n`;
    writeFileSync(path.join(OUT, "trails", file), body);
    index.push({ name: trail.name, difficulty: trail.difficulty, kind: trail.kind, direction: trail.direction, file });
    console.log(`${file.padEnd(28)} ${line.length} points`);
  }
  const park = {
    name: "Harrow Ridge Bike Park",
    slug: "harrow-ridge",
    fictional: true,
    note: "A fictional park invented for the Loamcast demo. Its place, trails and lifts do not exist.",
    timeZone: "America/Los_Angeles",
    center: CENTER,
    baseElevationM: BASE.ele,
    summitElevationM: SUMMIT.ele,
    mapLayers: {
      boundary: { type: "FeatureCollection", features: [boundary([...lines, serviceRoad()])] },
      lifts: { type: "FeatureCollection", features: [liftLine("Ridgeline Chair", BASE, SUMMIT), liftLine("Meadow Tow", BASE, MEADOW)] },
      landmarks: LANDMARKS,
    },
  };
  writeFileSync(path.join(OUT, "park.json"), `${JSON.stringify(park, null, 2)}\n`);
  writeFileSync(path.join(OUT, "trails.json"), `${JSON.stringify(index, null, 2)}\n`);
  console.log(`Wrote ${TRAILS.length} trails, park.json and trails.json to ${path.relative(process.cwd(), OUT)}`);
}

main();
