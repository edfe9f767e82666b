// MapLibre, configured once for the app. Imported only by the map components that next/dynamic
// loads in the browser, so no other page ships it.
import * as maplibregl from "maplibre-gl";
import "maplibre-gl/dist/maplibre-gl.css";

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
