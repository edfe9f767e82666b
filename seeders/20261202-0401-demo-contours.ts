/**
 * The demo park's contour lines and roads (fictional; made by scripts/generate-demo-map-layers.ts)
 * join its other base layers in Park.mapLayers.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { Park } from "@/models";

const folder = path.join(process.cwd(), "data/demo-park");
const read = (file: string) => JSON.parse(readFileSync(path.join(folder, file), "utf8"));

export async function up() {
  const park = await Park.findOne({ where: { slug: "harrow-ridge" } });
  if (!park) throw new Error("Run the demo accounts seeder first.");
  await park.update({ mapLayers: { ...park.mapLayers, contours: read("contours.geojson"), roads: read("roads.geojson") } });
}

export async function down() {
  const park = await Park.findOne({ where: { slug: "harrow-ridge" } });
  if (!park) return;
  const { contours: _contours, roads: _roads, ...rest } = park.mapLayers;
  await park.update({ mapLayers: rest });
}
