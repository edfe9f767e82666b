import type { TrailStatusKey } from "./status";

/** Source and layer ids of our own style, prefixed so they never clash with a hosted base style. */
export const SOURCE_IDS = { park: "lc-park", trails: "lc-trails", trailLabels: "lc-trail-labels", hazards: "lc-hazards", features: "lc-features" } as const;

export const trailLineLayerId = (status: TrailStatusKey) => `lc-trail-${status}` as const;

export const LAYER_IDS = {
  land: "lc-land",
  parkFill: "lc-park-fill",
  boundary: "lc-boundary",
  contours: "lc-contours",
  contoursIndex: "lc-contours-index",
  contourLabels: "lc-contour-labels",
  roadCasing: "lc-road-casing",
  roads: "lc-roads",
  roadLabels: "lc-road-labels",
  lifts: "lc-lifts",
  liftLabels: "lc-lift-labels",
  landmarks: "lc-landmarks",
  landmarkLabels: "lc-landmark-labels",
  trailCasing: "lc-trail-casing",
  trailHit: "lc-trail-hit",
  trailStatusTags: "lc-trail-status-tags",
  trailStatusMarks: "lc-trail-status-marks",
  trailNames: "lc-trail-names",
  features: "lc-features",
  featureLabels: "lc-feature-labels",
  hazards: "lc-hazards",
  hazardMarks: "lc-hazard-marks",
  hazardLabels: "lc-hazard-labels",
} as const;

/** Every layer that draws a trail line, one per status. */
export const TRAIL_LINE_LAYER_IDS = (["open", "caution", "closed", "uninspected"] as const).map(trailLineLayerId);

/** Layers riders can switch off and on from the map's controls. */
export const TOGGLE_GROUPS = {
  features: { label: "Trail features (berms, jumps, drops)", layers: [LAYER_IDS.features, LAYER_IDS.featureLabels] },
  hazards: { label: "Hazard pins", layers: [LAYER_IDS.hazards, LAYER_IDS.hazardMarks, LAYER_IDS.hazardLabels] },
  contours: { label: "Contour lines", layers: [LAYER_IDS.contours, LAYER_IDS.contoursIndex, LAYER_IDS.contourLabels] },
} as const;
export type ToggleGroup = keyof typeof TOGGLE_GROUPS;

/** What the staff pin map draws as draggable pins, so the style's own copies are hidden there. */
export const PIN_DRAWN_LAYERS = [...TOGGLE_GROUPS.features.layers, ...TOGGLE_GROUPS.hazards.layers] as const;
