/** Plain words for every value a ranger picks or a rider reads. One place, so screens agree. */
import type { HazardKind } from "@/lib/hazards/pure/schemas";
import type { FEATURE_STATES, ParkStateKind, ReportStatus } from "./vocabulary";

export const STATUS_LABELS: Record<ReportStatus, string> = { open: "Open", caution: "Caution", closed: "Closed" };
/** A sign that carries the status without colour: ✓, ! and ✕. */
export const STATUS_SIGNS: Record<ReportStatus, string> = { open: "✓", caution: "!", closed: "✕" };

export const FEATURE_LABELS: { [K in keyof typeof FEATURE_STATES]: string } = { berms: "Berms", jumps: "Jumps", wood: "Wooden features" };
export const FEATURE_STATE_LABELS: Record<string, string> = {
  firm: "firm",
  soft: "soft",
  rutted: "rutted",
  good: "good",
  "worn-lips": "worn lips",
  "rutted-landings": "rutted landings",
  dry: "dry",
  slick: "slick",
};

export const HAZARD_KIND_LABELS: Record<HazardKind, string> = {
  "fallen-tree": "Fallen tree",
  washout: "Washout",
  "damaged-feature": "Damaged feature",
  "wet-wooden-feature": "Wet wooden feature",
  machinery: "Machinery at work",
  other: "Other",
};

export const PARK_STATE_LABELS: Record<ParkStateKind, string> = {
  closed: "Whole park closed",
  delayed: "Opening delayed",
  advisory: "Advisory",
};

/** "berms soft · jumps good": the feature notes in one line. */
export function describeFeatures(features: Record<string, string | undefined>): string {
  return (Object.keys(FEATURE_LABELS) as (keyof typeof FEATURE_LABELS)[])
    .filter((k) => features[k])
    .map((k) => `${FEATURE_LABELS[k].toLowerCase()} ${FEATURE_STATE_LABELS[features[k]!] ?? features[k]}`)
    .join(" · ");
}
