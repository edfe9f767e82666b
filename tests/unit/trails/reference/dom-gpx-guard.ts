import { AppError } from "@/lib/shared/errors";
import { TRAIL_LIMITS } from "@/lib/trails/pure/limits";
import { tooManyPoints } from "@/lib/trails/pure/geometry-checks";

/**
 * Refuses a document type declaration or entity declaration before any XML parser sees the text
 * (ASVS 1.5.1; entity expansion is the classic "billion laughs" attack). GPX never needs either.
 */
export function refuseDoctype(text: string): void {
  if (/<!DOCTYPE/i.test(text) || /<!ENTITY/i.test(text)) {
    throw new AppError(
      422,
      "The file contains a DOCTYPE or ENTITY declaration, which GPX files never need. It was refused for safety; export the trail again from your GPS app.",
      "file",
    );
  }
}

const POINT_TAG = /<(?:[A-Za-z_][\w.-]*:)?(?:trkpt|rtept|wpt)[\s/>]/g;

/** Counts point elements in the raw text and stops as soon as the limit is passed (before parsing). */
export function refuseTooManyGpxPoints(text: string): void {
  POINT_TAG.lastIndex = 0;
  let count = 0;
  while (POINT_TAG.exec(text)) {
    count += 1;
    if (count > TRAIL_LIMITS.maxPoints) throw tooManyPoints();
  }
}

