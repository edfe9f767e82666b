// Public surface of the trail module: parse, measure, simplify, rate, export. Pure; no database.
export { parseTrailFile } from "./parse";
export { measureTrailUpload, processTrailUpload, type ProcessTrailOptions, type TrailMeasurement, type TrailUploadResult } from "./process-upload";
export { computeTrailStats, hasElevation, type TrailStats } from "./stats";
export { climbAndDescent, steepestGradePct } from "./elevation";
export { elevationProfile, type ProfilePoint } from "./profile";
export { simplifyLine } from "./simplify";
export { suggestedDifficulty, IMBA_GRADE_LIMITS, type Difficulty } from "./difficulty";
export { DIFFICULTIES, TRAIL_KINDS } from "./vocabulary";
export { snapFeatures, featureKind, FEATURE_KINDS, type FeatureKind, type SnappedFeature } from "./features";
export { toGpx, escapeXml, type ExportableTrail } from "./export-gpx";
export { toGeoJson } from "./export-geojson";
export { TRAIL_LIMITS, CLIMB_THRESHOLD_M, GRADE_WINDOW_M, SIMPLIFY_TOLERANCE_M } from "./limits";
export type { ParsedTrail, ParseTrailInput, TrailWaypoint, LonLat, Position } from "./types";
