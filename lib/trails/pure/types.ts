import type { Position } from "geojson";

export type { Position };

export type LonLat = { lon: number; lat: number };

export type TrailWaypoint = { name?: string; type?: string; lon: number; lat: number; ele?: number };

export type SourceFormat = "gpx" | "geojson";

/**
 * A trail as read from a file. Each segment is kept separately ([lon, lat, ele?] positions):
 * a GPX trkseg break means the signal was lost, so segments are never joined.
 */
export type ParsedTrail = {
  name?: string;
  segments: Position[][];
  waypoints: TrailWaypoint[];
  sourceFormat: SourceFormat;
  /** Things we accepted but that staff may want to know (ignored routes, dropped one-point segments…). */
  warnings: string[];
};

export type ParseTrailInput = {
  bytes: Buffer | Uint8Array;
  filename: string;
  contentType?: string;
  /** The park's location; enables the distance and swapped-coordinates checks. */
  parkCenter?: LonLat;
};

/** What a format reader hands to the shared geometry checks. */
export type RawTrail = Omit<ParsedTrail, "sourceFormat">;
