/**
 * Limits and thresholds for trail files. Each is documented in docs/trail-geometry.md;
 * change them here and nowhere else.
 */
export const TRAIL_LIMITS = {
  /** Largest upload accepted, checked on the raw bytes before decoding (ASVS 5.2.1). */
  maxFileBytes: 20 * 1024 * 1024,
  /** Most points (line points plus waypoints) in one file; counted before and during parsing. */
  maxPoints: 200_000,
  /**
   * Shortest line taken as a trail. Below it the file is a misfire (a recording started and
   * stopped at once, a test tap on a phone); the shortest real line in a park, one feature with its
   * run-in and landing, is longer. Common practice, no published source.
   */
  minTrailLengthM: 50,
  /** Longest believable step between consecutive points of one segment. */
  maxStepM: 500,
  /** A line whose nearest point is further than this from the park's centre is refused. */
  maxDistanceFromParkM: 50_000,
  /** Plausible elevations: below the Dead Sea shore or above the highest summits is an error. */
  minElevationM: -450,
  maxElevationM: 9_000,
  /** Longest trail name taken from a file (longer ones are cut). */
  maxNameLength: 80,
} as const;

/** Elevation noise threshold for climb and descent (hysteresis), metres. */
export const CLIMB_THRESHOLD_M = 3;

/** Distance window over which the steepest grade is measured, metres. */
export const GRADE_WINDOW_M = 30;

/** Default simplification tolerance for the map line, metres. */
export const SIMPLIFY_TOLERANCE_M = 2;

/** Metres in one degree of latitude on Turf's sphere (2πR/360, R = 6 371 008.8 m). */
export const METRES_PER_DEGREE = (2 * Math.PI * 6_371_008.8) / 360;
