/**
 * The words of a trail report, free of any library so client screens can import them
 * cheaply. lib/conditions/pure/schemas.ts builds its schemas from these lists.
 */
export const STATUSES = ["open", "caution", "closed"] as const;
/** The same list the pressure engine reads (a unit test keeps them equal). */
export const SURFACES = ["dry", "dusty", "tacky", "damp", "wet", "muddy", "loose", "rocky", "frozen", "snow"] as const;
/** The state of each kind of built feature a ranger judges. */
export const FEATURE_STATES = {
  berms: ["firm", "soft", "rutted"],
  jumps: ["good", "worn-lips", "rutted-landings"],
  wood: ["dry", "slick"],
} as const;
export const PARK_STATES = ["closed", "delayed", "advisory"] as const;

export type ReportStatus = (typeof STATUSES)[number];
export type Surface = (typeof SURFACES)[number];
/** The built features a morning check reports a state for (berms, jumps, wood), not the kinds of a trail's features. */
export type FeatureGroup = keyof typeof FEATURE_STATES;
export type FeatureStates = { [K in FeatureGroup]?: (typeof FEATURE_STATES)[K][number] };
export type ParkStateKind = (typeof PARK_STATES)[number];
