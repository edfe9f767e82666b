// MapLibre, configured once for the app. Imported only by the map components that next/dynamic
// loads in the browser, so no other page ships it.
import * as maplibregl from "maplibre-gl";
import "maplibre-gl/dist/maplibre-gl.css";
import type { Bounds } from "@/lib/map/pure/bounds";

/** Turbopack cannot resolve MapLibre's worker: a copy is served from public/ (scripts/copy-map-worker.mjs). */
export const MAP_WORKER_URL = "/vendor/maplibre-gl-worker.mjs";
maplibregl.setWorkerUrl(MAP_WORKER_URL);

export { maplibregl };

/**
 * Test hooks: `data-map-state` on the container ("loading", "idle", "error"), and the map on
 * `window.__loamcastMap` so browser tests can ask it what it drew. Both harmless in production.
 */
export function exposeMapForTests(map: maplibregl.Map) {
  (window as unknown as { __loamcastMap?: maplibregl.Map }).__loamcastMap = map;
}

/**
 * What every Loamcast map shares: our MapLibre, the style, opening fitted to `bounds`, filling its
 * box, and no rotating or tilting (a park map is read north-up; two fingers should only zoom).
 */
export function baseMapProps(styleUrl: string, bounds: Bounds) {
  return {
    mapLib: maplibregl,
    mapStyle: styleUrl,
    initialViewState: { bounds, fitBoundsOptions: { padding: 28 } },
    style: { width: "100%", height: "100%" },
    dragRotate: false,
    pitchWithRotate: false,
    touchPitch: false,
  };
}
