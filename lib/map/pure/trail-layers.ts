import type { LayerSpecification } from "maplibre-gl";
import { LAYER_IDS, SOURCE_IDS, trailLineLayerId } from "./layer-ids";
import { BASE_COLOURS as C, difficultyMatch, trailCasing, trailColour } from "./palette";
import { FONT_STACK } from "./sources";
import { STATUS_LOOKS, TRAIL_STATUS_KEYS, type TrailStatusKey } from "./status";

/**
 * Trails, their status, built features and hazard pins. Colour says difficulty; pattern and
 * words say status (lib/map/pure/status.ts), so the map reads the same in grayscale.
 */
const trails = SOURCE_IDS.trails;
const statusOf = ["coalesce", ["get", "status"], "uninspected"];
const hasStatus = (keys: readonly TrailStatusKey[]) => ["in", statusOf, ["literal", keys]] as never;
const statusMatch = (valueOf: (k: TrailStatusKey) => string | number, fallback: string | number) =>
  ["match", statusOf, ...TRAIL_STATUS_KEYS.flatMap((k) => [k, valueOf(k)]), fallback];

/** Line width in pixels for a normal trail at each zoom; a status scales it (and a selected trail widens). */
const WIDTH_BY_ZOOM: Array<[number, number]> = [
  [11, 2],
  [13, 3],
  [15, 4.5],
  [17, 7],
];
const widthExpr = (extraPx: number, scaleByStatus: boolean) =>
  [
    "interpolate",
    ["linear"],
    ["zoom"],
    ...WIDTH_BY_ZOOM.flatMap(([zoom, px]) => [zoom, ["+", ["*", px, scaleByStatus ? statusMatch((k) => STATUS_LOOKS[k].widthScale, 1) : 1], extraPx]]),
  ] as never;

const labelPaint = { "text-color": C.text, "text-halo-color": C.halo, "text-halo-width": 2 };

function trailLineLayer(status: TrailStatusKey): LayerSpecification {
  const look = STATUS_LOOKS[status];
  return {
    id: trailLineLayerId(status),
    type: "line",
    source: trails,
    filter: hasStatus([status]),
    layout: { "line-cap": look.lineCap, "line-join": "round" },
    paint: {
      "line-color": difficultyMatch(trailColour, "#6b7280") as never,
      "line-width": widthExpr(0, true),
      ...(look.dasharray ? { "line-dasharray": look.dasharray } : {}),
    },
  };
}

export function trailLayers(): LayerSpecification[] {
  return [
    {
      id: LAYER_IDS.trailCasing,
      type: "line",
      source: trails,
      layout: { "line-cap": "round", "line-join": "round" },
      paint: {
        "line-color": ["case", ["boolean", ["feature-state", "selected"], false], C.hazard, difficultyMatch(trailCasing, "#ffffff")] as never,
        "line-width": ["interpolate", ["linear"], ["zoom"], 11, ["case", ["boolean", ["feature-state", "selected"], false], 9, 4], 17, ["case", ["boolean", ["feature-state", "selected"], false], 16, 10]] as never,
        "line-opacity": 0.9,
      },
    },
    ...TRAIL_STATUS_KEYS.map(trailLineLayer),
    {
      // Invisible and wide: a finger on a phone finds the trail without hitting the 3-pixel line.
      id: LAYER_IDS.trailHit,
      type: "line",
      source: trails,
      paint: { "line-color": "#000000", "line-width": 22, "line-opacity": 0 },
    },
    {
      // Close up, the status word also runs along the line itself.
      id: LAYER_IDS.trailStatusTags,
      type: "symbol",
      source: trails,
      minzoom: 15,
      filter: hasStatus(TRAIL_STATUS_KEYS.filter((k) => STATUS_LOOKS[k].repeatTag)),
      layout: {
        "symbol-placement": "line",
        "symbol-spacing": 160,
        "text-field": statusMatch((k) => STATUS_LOOKS[k].tag, "") as never,
        "text-font": FONT_STACK,
        "text-size": 12,
        "text-letter-spacing": 0.12,
      },
      paint: labelPaint,
    },
    {
      // At every zoom: the status word at points along the line (lib/map/pure/trail-labels.ts).
      id: LAYER_IDS.trailStatusMarks,
      type: "symbol",
      source: SOURCE_IDS.trailLabels,
      maxzoom: 15,
      filter: ["==", ["get", "role"], "status"],
      layout: { "text-field": ["get", "tag"], "text-font": FONT_STACK, "text-size": 12, "text-letter-spacing": 0.1, "text-padding": 1 },
      paint: { ...labelPaint, "text-halo-width": 2.2 },
    },
    {
      id: LAYER_IDS.trailNames,
      type: "symbol",
      source: SOURCE_IDS.trailLabels,
      filter: ["==", ["get", "role"], "name"],
      layout: {
        "text-field": ["format", ["get", "name"], {}, "\n", {}, ["get", "tag"], { "font-scale": 0.8 }] as never,
        "text-font": FONT_STACK,
        "text-size": ["interpolate", ["linear"], ["zoom"], 12, 12, 16, 15] as never,
        "text-variable-anchor": ["center", "top", "bottom", "left", "right"],
        "text-radial-offset": 0.6,
        "text-justify": "auto",
        "symbol-sort-key": ["match", ["get", "status"], "closed", 0, "caution", 1, 2] as never,
      },
      paint: labelPaint,
    },
  ];
}

export function featureLayers(): LayerSpecification[] {
  return [
    {
      id: LAYER_IDS.features,
      type: "circle",
      source: SOURCE_IDS.features,
      minzoom: 14.5,
      paint: { "circle-radius": 4, "circle-color": C.feature, "circle-stroke-color": C.featureStroke, "circle-stroke-width": 1.5 },
    },
    {
      id: LAYER_IDS.featureLabels,
      type: "symbol",
      source: SOURCE_IDS.features,
      minzoom: 15.5,
      layout: { "text-field": ["get", "label"], "text-font": FONT_STACK, "text-size": 12, "text-anchor": "left", "text-offset": [0.7, 0] },
      paint: { ...labelPaint, "text-halo-width": 1.5 },
    },
  ];
}

/** A hazard pin: an amber disc with a "!" and the kind in words, readable without the colour. */
export function hazardLayers(): LayerSpecification[] {
  return [
    {
      id: LAYER_IDS.hazards,
      type: "circle",
      source: SOURCE_IDS.hazards,
      paint: { "circle-radius": 10, "circle-color": C.hazard, "circle-stroke-color": C.hazardStroke, "circle-stroke-width": 2 },
    },
    {
      id: LAYER_IDS.hazardMarks,
      type: "symbol",
      source: SOURCE_IDS.hazards,
      layout: { "text-field": "!", "text-font": FONT_STACK, "text-size": 15, "text-allow-overlap": true, "text-ignore-placement": true },
      paint: { "text-color": C.hazardStroke },
    },
    {
      id: LAYER_IDS.hazardLabels,
      type: "symbol",
      source: SOURCE_IDS.hazards,
      minzoom: 13.5,
      layout: { "text-field": ["concat", "Hazard: ", ["get", "kindLabel"]], "text-font": FONT_STACK, "text-size": 12, "text-anchor": "top", "text-offset": [0, 1.1] },
      paint: labelPaint,
    },
  ];
}
