/**
 * The demo park's week of conditions (invented): two dry days, a night of rain, a closure
 * while the technical trail drains, then drying back to tacky dirt. Not data from anywhere.
 */
import type { ReportInput } from "@/lib/conditions/pure/schemas";

export type DayKind = "dry" | "dusty" | "rain" | "after-rain" | "drying" | "tacky" | "hero";

/** Day offsets from today (0 = today), oldest first. */
export const WEEK: { offset: number; kind: DayKind }[] = [
  { offset: -6, kind: "dry" },
  { offset: -5, kind: "dusty" },
  { offset: -4, kind: "rain" },
  { offset: -3, kind: "after-rain" },
  { offset: -2, kind: "drying" },
  { offset: -1, kind: "tacky" },
  { offset: 0, kind: "hero" },
];

const SURFACES: Record<DayKind, ReportInput["surfaces"]> = {
  dry: ["dry"],
  dusty: ["dusty", "loose"],
  rain: ["wet", "muddy"],
  "after-rain": ["muddy", "damp"],
  drying: ["damp", "tacky"],
  tacky: ["tacky"],
  hero: ["tacky"],
};

const FEATURES: Record<DayKind, ReportInput["features"]> = {
  dry: { berms: "firm", jumps: "good", wood: "dry" },
  dusty: { berms: "firm", jumps: "worn-lips", wood: "dry" },
  rain: { berms: "soft", jumps: "rutted-landings", wood: "slick" },
  "after-rain": { berms: "soft", jumps: "rutted-landings", wood: "slick" },
  drying: { berms: "soft", jumps: "good", wood: "slick" },
  tacky: { berms: "firm", jumps: "good", wood: "dry" },
  hero: { berms: "firm", jumps: "good", wood: "dry" },
};

/** Which built features each demo trail has (by name). */
const TRAIL_FEATURES: Record<string, (keyof ReportInput["features"])[]> = {
  "Mossback Ramble": ["berms"],
  "Cedar Skip": ["berms", "jumps"],
  "Switchgrass Traverse": ["wood"],
  Tumblewire: ["berms", "jumps"],
  "Slatebelt Flow": ["berms", "wood"],
  "Long Haul Climb": [],
  Gnarlroot: ["wood"],
  "Basalt Chute": ["berms", "jumps"],
  "Scree Stairs": [],
  Plumbline: ["berms", "jumps"],
};

/** Trails that need more than an "open" on a given kind of day, with the ranger's reason. */
const EXCEPTIONS: Partial<Record<DayKind, Record<string, Pick<ReportInput, "status" | "reason" | "note">>>> = {
  rain: {
    Gnarlroot: { status: "caution", reason: "Wet roots on every descent", note: null },
    "Scree Stairs": { status: "caution", reason: "Rock slabs slick in the rain", note: null },
    "Basalt Chute": { status: "caution", reason: "Muddy ruts forming in the lower turns", note: null },
  },
  "after-rain": {
    Gnarlroot: { status: "closed", reason: "Saturated after the overnight rain; closed to protect the tread", note: "Standing water in the root garden." },
    "Scree Stairs": { status: "caution", reason: "Slabs still wet in the shade", note: null },
    Plumbline: { status: "caution", reason: "Soft run-outs below the drops", note: null },
  },
  drying: {
    Gnarlroot: { status: "closed", reason: "Lower root section still saturated", note: "Check again tomorrow morning." },
  },
  tacky: {
    Gnarlroot: { status: "caution", reason: "Reopened; roots still greasy where the sun does not reach", note: null },
  },
};

export function demoReport(trailName: string, kind: DayKind): ReportInput {
  const exception = EXCEPTIONS[kind]?.[trailName];
  const features = Object.fromEntries((TRAIL_FEATURES[trailName] ?? []).map((f) => [f, FEATURES[kind][f]]));
  const surfaces = [...SURFACES[kind], ...(["Scree Stairs", "Basalt Chute"].includes(trailName) ? (["rocky"] as const) : [])];
  return {
    status: exception?.status ?? "open",
    reason: exception?.reason ?? null,
    surfaces,
    features,
    note: exception?.note ?? (kind === "hero" && trailName === "Tumblewire" ? "Lips reshaped yesterday evening." : null),
  };
}

/** A correction on the rainy day: the first post said open, the ranger revised it after a second look. */
export const RAINY_DAY_CORRECTION = {
  trailName: "Tumblewire",
  report: { status: "caution", reason: "Landings soft after the rain; roll the big step-down", surfaces: ["wet", "muddy"], features: { berms: "soft", jumps: "rutted-landings" }, note: null } satisfies ReportInput,
};
