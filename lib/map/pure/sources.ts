import type { GeoJSONSourceSpecification } from "maplibre-gl";
import { SOURCE_IDS } from "./layer-ids";

/** The app's own GeoJSON endpoints for one park: relative URLs, so the map needs no other host. */
export function parkDataUrls(parkSlug: string) {
  const base = `/api/parks/${encodeURIComponent(parkSlug)}`;
  return {
    style: `${base}/map-style.json`,
    park: `${base}/park-layers.geojson`,
    trails: `${base}/trails.geojson`,
    trailLabels: `${base}/trail-labels.geojson`,
    hazards: `${base}/hazards.geojson`,
    features: `${base}/features.geojson`,
  };
}

/** Where labels get their letters: Inter, served by the app (no glyph server needed). */
export const MAP_FONT = { name: "Loamcast Sans", url: "/map/fonts/inter-latin-var.woff2" } as const;
export const FONT_STACK = [MAP_FONT.name, "sans-serif"];

export function parkSources(parkSlug: string): Record<string, GeoJSONSourceSpecification> {
  const urls = parkDataUrls(parkSlug);
  return {
    [SOURCE_IDS.park]: { type: "geojson", data: urls.park },
    [SOURCE_IDS.trails]: { type: "geojson", data: urls.trails, promoteId: "id" },
    [SOURCE_IDS.trailLabels]: { type: "geojson", data: urls.trailLabels },
    [SOURCE_IDS.hazards]: { type: "geojson", data: urls.hazards },
    [SOURCE_IDS.features]: { type: "geojson", data: urls.features },
  };
}
