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

export type TrailUploadResult = {
  parsed: ParsedTrail;
  stats: TrailStats;
  simplified: LineString | MultiLineString;
  profile: ProfilePoint[];
  features: SnappedFeature[];
  /** Advice for staff from the grades (IMBA); null without elevation. */
  suggestedDifficulty: Difficulty | null;
};

export type ProcessTrailOptions = { simplifyToleranceM?: number; profilePoints?: number };

/** Everything the route layer stores for an uploaded trail file, computed without a database. */
export function processTrailUpload(input: ParseTrailInput, options: ProcessTrailOptions = {}): TrailUploadResult {
  const parsed = parseTrailFile(input);
  const stats = computeTrailStats(parsed.segments);
  return {
    parsed,
    stats,
    simplified: simplifyLine(parsed.segments, options.simplifyToleranceM ?? SIMPLIFY_TOLERANCE_M),
    profile: elevationProfile(parsed.segments, options.profilePoints ?? 300),
    features: snapFeatures(parsed.waypoints, parsed.segments),
    suggestedDifficulty: suggestedDifficulty(stats),
  };
}
