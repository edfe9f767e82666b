import type { Feature, FeatureCollection } from "geojson";

/**
 * A park's own base layers (Park.mapLayers) as one GeoJSON collection for the map: each feature
 * keeps its properties and gains `layer`, which the style filters on. Unknown layers are left out.
 */
const LAYER_OF: Record<string, string> = { boundary: "boundary", contours: "contour", roads: "road", lifts: "lift", landmarks: "landmark" };

export function parkLayersCollection(mapLayers: Record<string, FeatureCollection | undefined>): FeatureCollection {
  const features: Feature[] = [];
  for (const [key, layer] of Object.entries(LAYER_OF)) {
    for (const feature of mapLayers[key]?.features ?? []) {
      features.push({ type: "Feature", properties: { ...(feature.properties ?? {}), layer }, geometry: feature.geometry });
    }
  }
  return { type: "FeatureCollection", features };
}
