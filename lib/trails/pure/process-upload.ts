import type { LineString, MultiLineString } from "geojson";
import type { Difficulty } from "@/lib/trails/pure/schemas";
import { suggestedDifficulty } from "./difficulty";
import { snapFeatures, type SnappedFeature } from "./features";
import { SIMPLIFY_TOLERANCE_M } from "./limits";
import { parseTrailFile } from "./parse";
import { elevationProfile, type ProfilePoint } from "./profile";
import { simplifyLine } from "./simplify";
import { computeTrailStats, type TrailStats } from "./stats";
import type { ParsedTrail, ParseTrailInput } from "./types";

/** What a file is found to be: every check passed, measured, profiled, its features placed. */
export type TrailMeasurement = {
  parsed: ParsedTrail;
  stats: TrailStats;
  profile: ProfilePoint[];
  features: SnappedFeature[];
  /** Advice for staff from the grades (IMBA); null without elevation. */
  suggestedDifficulty: Difficulty | null;
};

/** A measurement plus the lighter line the map draws: everything a save stores. */
export type TrailUploadResult = TrailMeasurement & { simplified: LineString | MultiLineString };

export type ProcessTrailOptions = { simplifyToleranceM?: number; profilePoints?: number };

/**
 * Every check and figure of an uploaded trail file, without a database and without the map line:
 * what the preview shows. Refuses exactly what processTrailUpload refuses (simplifying never does).
 */
export function measureTrailUpload(input: ParseTrailInput, options: ProcessTrailOptions = {}): TrailMeasurement {
  const parsed = parseTrailFile(input);
  const stats = computeTrailStats(parsed.segments);
  return {
    parsed,
    stats,
    profile: elevationProfile(parsed.segments, options.profilePoints ?? 300),
    features: snapFeatures(parsed.waypoints, parsed.segments),
    suggestedDifficulty: suggestedDifficulty(stats),
  };
}

/** Everything the route layer stores for an uploaded trail file, computed without a database. */
export function processTrailUpload(input: ParseTrailInput, options: ProcessTrailOptions = {}): TrailUploadResult {
  const measured = measureTrailUpload(input, options);
  return { ...measured, simplified: simplifyLine(measured.parsed.segments, options.simplifyToleranceM ?? SIMPLIFY_TOLERANCE_M) };
}
