import "server-only";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { measureTrailUpload, type TrailMeasurement } from "@/lib/trails/pure";
import type { Park } from "@/models";
import type { UploadedFile } from "./save-upload";

const tenth = (x: number | null) => (x === null ? null : Math.round(x * 10) / 10);

/** What staff see before saving: the figures under their API names, the profile, features and warnings. */
export function uploadResultView(result: TrailMeasurement, filename: string) {
  const { stats } = result;
  return {
    name: result.parsed.name ?? null,
    filename,
    sourceFormat: result.parsed.sourceFormat,
    segments: result.parsed.segments.length,
    pointCount: stats.pointCount,
    lengthM: tenth(stats.lengthM)!,
    ascentM: tenth(stats.ascentM),
    descentM: tenth(stats.descentM),
    avgGradePct: tenth(stats.avgGradePct),
    maxGradePct: tenth(stats.maxGradePct),
    minElevationM: tenth(stats.minElevationM),
    maxElevationM: tenth(stats.maxElevationM),
    suggestedDifficulty: result.suggestedDifficulty,
    profile: result.profile,
    features: result.features.map((f) => ({ kind: f.kind, name: f.name ?? null, distanceAlongM: tenth(f.distanceAlongM)!, offsetM: tenth(f.offsetM)! })),
    warnings: result.parsed.warnings,
  };
}
export type UploadPreview = ReturnType<typeof uploadResultView>;

/**
 * Checks and measures a file exactly as a save would, and stores nothing. The map line is not
 * simplified: the preview screen draws none, and on a 200,000-point file that was a tenth of the work.
 */
export function previewTrailUpload(actor: Actor | null, park: Park, file: UploadedFile): UploadPreview {
  authorize(actor, "trail:write", { parkId: park.id });
  const result = measureTrailUpload({ ...file, parkCenter: { lon: park.centerLon, lat: park.centerLat } });
  return uploadResultView(result, file.filename);
}
