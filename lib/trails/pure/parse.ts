import { AppError } from "@/lib/shared/errors";
import { decodeText } from "./decode-text";
import { checkContentMatches, formatFromName, refuseBinaryContent } from "./file-type";
import { checkTrailGeometry } from "./geometry-checks";
import { TRAIL_LIMITS } from "./limits";
import { parseGeoJson } from "./parse-geojson";
import { parseGpx } from "./parse-gpx";
import type { ParsedTrail, ParseTrailInput } from "./types";

const MEGABYTE = 1024 * 1024;

/**
 * Reads an uploaded trail file (GPX 1.1 or GeoJSON RFC 7946) into separate segments and waypoints.
 * Every refusal is an AppError with a message for park staff: 413 too big, 415 not a trail
 * format, 422 a trail file whose content is wrong. Cheap checks run first: size, name and type,
 * magic bytes, encoding, then the format's own checks, then the shared geometry rules.
 */
export function parseTrailFile(input: ParseTrailInput): ParsedTrail {
  const { bytes, filename, contentType, parkCenter } = input;
  if (bytes.length > TRAIL_LIMITS.maxFileBytes) {
    throw new AppError(
      413,
      `The file is ${(bytes.length / MEGABYTE).toFixed(1)} MB; the limit is ${TRAIL_LIMITS.maxFileBytes / MEGABYTE} MB. Thin the recording and upload it again.`,
      "file",
    );
  }
  const format = formatFromName(filename, contentType);
  refuseBinaryContent(bytes);
  const text = decodeText(bytes);
  if (text.trim() === "") throw new AppError(422, "The file is empty.", "file");
  checkContentMatches(format, text);

  const raw = format === "gpx" ? parseGpx(text) : parseGeoJson(text);
  return { ...checkTrailGeometry(raw, parkCenter), sourceFormat: format };
}
