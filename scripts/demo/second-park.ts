import { toGeoJson } from "@/lib/trails/pure/export-geojson";
import type { Difficulty, TrailKind } from "@/lib/trails/pure/schemas";
import { synthesizeTrail } from "@/scripts/demo/synthetic-trails";

/** The second demo park's trails (fictional): from the shuttle drop to the car park. */
export const DROP = { lon: -105.622, lat: 39.031, ele: 2980 }; // where the shuttle leaves riders
export const LOT = { lon: -105.598, lat: 39.011, ele: 2450 }; // car park and pick-up

/** Each rating is the one the upload's own difficulty advice suggests for the line (checked when this was written). */
export const SECOND_PARK_TRAILS: { name: string; difficulty: Difficulty; kind: TrailKind; gradePct: number; variation: number; bulgeM: number; meanderM: number }[] = [
  { name: "Ashfall Glide", difficulty: "easy", kind: "flow", gradePct: 4.5, variation: 0.2, bulgeM: 420, meanderM: 120 },
  { name: "Obsidian Rake", difficulty: "difficult", kind: "technical", gradePct: 13, variation: 0.35, bulgeM: -260, meanderM: 90 },
  { name: "Pumice Run", difficulty: "intermediate", kind: "jump", gradePct: 9, variation: 0.35, bulgeM: 80, meanderM: 110 },
];

/** One trail as the GeoJSON file a crew would upload (deterministic: seeded). */
export function secondParkTrailFile(trail: (typeof SECOND_PARK_TRAILS)[number], index: number) {
  const line = synthesizeTrail({
    seed: 3100 + index, start: [DROP.lon, DROP.lat], end: [LOT.lon, LOT.lat], startEleM: DROP.ele, endEleM: LOT.ele,
    lengthM: (DROP.ele - LOT.ele) / (trail.gradePct / 100), bulgeM: trail.bulgeM, meanderM: trail.meanderM,
    spacingM: 8, gradeVariation: trail.variation, rollerM: 0.8, rollerWavelengthM: 60, noiseM: 0.3,
  });
  const bytes = Buffer.from(JSON.stringify(toGeoJson({ name: trail.name, segments: [line], waypoints: [] })));
  return { bytes, filename: `${trail.name.toLowerCase().replace(/\s+/g, "-")}.geojson` };
}
