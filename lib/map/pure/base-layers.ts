import type { LayerSpecification } from "maplibre-gl";
import { LAYER_IDS, SOURCE_IDS } from "./layer-ids";
import { BASE_COLOURS as C } from "./palette";
import { FONT_STACK } from "./sources";

/**
 * The park's own base layers, all from one GeoJSON source whose features carry a `layer`
 * property (boundary, contour, road, lift, landmark): see lib/map/pure/park-layers.ts.
 */
const source = SOURCE_IDS.park;
const ofLayer = (name: string) => ["==", ["get", "layer"], name] as never;
const halo = { "text-color": C.text, "text-halo-color": C.halo, "text-halo-width": 1.6 };

/** Land and the park's area: dropped when a hosted base style draws the ground instead. */
export function groundLayers(): LayerSpecification[] {
  return [
    { id: LAYER_IDS.land, type: "background", paint: { "background-color": C.land } },
    { id: LAYER_IDS.parkFill, type: "fill", source, filter: ofLayer("boundary"), paint: { "fill-color": C.parkFill } },
  ];
}

/** Contours, the boundary, roads and lifts: drawn on our ground or on a hosted style. */
export function parkBaseLayers(): LayerSpecification[] {
  return [
    {
      id: LAYER_IDS.contours,
      type: "line",
      source,
      filter: ["all", ofLayer("contour"), ["!", ["get", "index"]]],
      paint: { "line-color": C.contour, "line-width": ["interpolate", ["linear"], ["zoom"], 12, 0.4, 16, 0.9] },
    },
    {
      id: LAYER_IDS.contoursIndex,
      type: "line",
      source,
      filter: ["all", ofLayer("contour"), ["get", "index"]],
      paint: { "line-color": C.contourIndex, "line-width": ["interpolate", ["linear"], ["zoom"], 12, 0.8, 16, 1.6] },
    },
    {
      id: LAYER_IDS.contourLabels,
      type: "symbol",
      source,
      minzoom: 13,
      filter: ["all", ofLayer("contour"), ["get", "index"]],
      layout: {
        "symbol-placement": "line",
        "symbol-spacing": 320,
        "text-field": ["concat", ["to-string", ["get", "elevationM"]], " m"],
        "text-font": FONT_STACK,
        "text-size": 12,
      },
      paint: { "text-color": C.contourLabel, "text-halo-color": C.parkFill, "text-halo-width": 1.4 },
    },
    {
      id: LAYER_IDS.boundary,
      type: "line",
      source,
      filter: ofLayer("boundary"),
      paint: { "line-color": C.boundary, "line-width": 1.5, "line-dasharray": [5, 2, 1, 2] },
    },
    {
      id: LAYER_IDS.roadCasing,
      type: "line",
      source,
      filter: ofLayer("road"),
      layout: { "line-cap": "round", "line-join": "round" },
      paint: { "line-color": C.roadCasing, "line-width": ["interpolate", ["linear"], ["zoom"], 12, 3, 16, 8] },
    },
    {
      id: LAYER_IDS.roads,
      type: "line",
      source,
      filter: ofLayer("road"),
      layout: { "line-cap": "round", "line-join": "round" },
      paint: { "line-color": C.road, "line-width": ["interpolate", ["linear"], ["zoom"], 12, 1.6, 16, 5.5] },
    },
    {
      id: LAYER_IDS.roadLabels,
      type: "symbol",
      source,
      minzoom: 14,
      filter: ofLayer("road"),
      layout: { "symbol-placement": "line", "text-field": ["get", "name"], "text-font": FONT_STACK, "text-size": 12 },
      paint: { ...halo, "text-color": C.contourLabel },
    },
    {
      id: LAYER_IDS.lifts,
      type: "line",
      source,
      filter: ofLayer("lift"),
      paint: { "line-color": C.lift, "line-width": 1.6 },
    },
    {
      id: LAYER_IDS.liftLabels,
      type: "symbol",
      source,
      filter: ofLayer("lift"),
      layout: {
        "symbol-placement": "line-center",
        "text-field": ["concat", ["get", "name"], " (lift)"],
        "text-font": FONT_STACK,
        "text-size": 12,
        "text-offset": [0, -0.8],
      },
      paint: halo,
    },
  ];
}

/** Summit, base and other named spots: drawn above the trails so their names stay readable. */
export function landmarkLayers(): LayerSpecification[] {
  return [
    {
      id: LAYER_IDS.landmarks,
      type: "circle",
      source,
      filter: ofLayer("landmark"),
      paint: { "circle-radius": 5, "circle-color": C.landmark, "circle-stroke-color": C.halo, "circle-stroke-width": 2 },
    },
    {
      id: LAYER_IDS.landmarkLabels,
      type: "symbol",
      source,
      filter: ofLayer("landmark"),
      layout: {
        "text-field": ["case", ["has", "elevationM"], ["concat", ["get", "name"], "\n", ["to-string", ["get", "elevationM"]], " m"], ["get", "name"]],
        "text-font": FONT_STACK,
        "text-size": 12,
        "text-anchor": "top",
        "text-offset": [0, 0.7],
      },
      paint: halo,
    },
  ];
}
