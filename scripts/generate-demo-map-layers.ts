/**
 * Writes the FICTIONAL demo park's contour lines and roads (data/demo-park/contours.geojson and
 * roads.geojson) from park.json, through scripts/demo/map-layers.ts. Deterministic: running it
 * again gives the same files. Run: npx tsx scripts/generate-demo-map-layers.ts
 */
import { readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { demoContours, demoRoads } from "@/scripts/demo/map-layers";

const DIR = path.join(process.cwd(), "data", "demo-park");
const park = JSON.parse(readFileSync(path.join(DIR, "park.json"), "utf8"));

for (const [file, collection] of [
  ["contours.geojson", demoContours(park)],
  ["roads.geojson", demoRoads(park)],
] as const) {
  writeFileSync(path.join(DIR, file), `${JSON.stringify(collection)}\n`);
  console.log(`› ${file}: ${collection.features.length} features`);
}
