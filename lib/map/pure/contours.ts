import { isolines, pointGrid } from "@turf/turf";
import type { FeatureCollection, MultiLineString, Position } from "geojson";

/** Elevation in metres at a longitude and latitude. */
export type ElevationModel = (lon: number, lat: number) => number;

export type ContourOptions = {
  bbox: [minLon: number, minLat: number, maxLon: number, maxLat: number];
  /** Spacing of the sampling grid, metres. */
  cellSizeM: number;
  /** Height between contour lines, metres. */
  intervalM: number;
  /** Every contour at a multiple of this is an index contour (drawn heavier and labelled). */
  indexEveryM: number;
  elevationAt: ElevationModel;
  /** Decimal places kept in coordinates (5 ≈ 1 m): smaller files, identical output every run. */
  decimals?: number;
};

export type ContourProperties = { elevationM: number; index: boolean };

/**
 * Contour lines from an elevation model: sample it on a regular grid (turf.pointGrid), then
 * trace isolines (turf.isolines, marching squares) at every multiple of the interval.
 * Pure and deterministic: the same model and options always give the same lines.
 */
export function contourLines(options: ContourOptions): FeatureCollection<MultiLineString, ContourProperties> {
  const { bbox, cellSizeM, intervalM, indexEveryM, elevationAt, decimals = 5 } = options;
  const grid = pointGrid(bbox, cellSizeM, { units: "meters" });
  let [low, high] = [Infinity, -Infinity];
  for (const point of grid.features) {
    const [lon, lat] = point.geometry.coordinates;
    const elevationM = elevationAt(lon, lat);
    point.properties = { elevationM };
    low = Math.min(low, elevationM);
    high = Math.max(high, elevationM);
  }
  const breaks: number[] = [];
  for (let level = Math.ceil(low / intervalM) * intervalM; level <= high; level += intervalM) breaks.push(level);
  if (breaks.length === 0) return { type: "FeatureCollection", features: [] };

  const traced = isolines(grid, breaks, { zProperty: "elevationM" });
  const factor = 10 ** decimals;
  const round = (p: Position): Position => [Math.round(p[0] * factor) / factor, Math.round(p[1] * factor) / factor];
  const features = traced.features.flatMap((feature) => {
    const lines = feature.geometry.coordinates.map((line) => dropRepeats(line.map(round))).filter((line) => line.length >= 2);
    if (lines.length === 0) return [];
    const elevationM = Number(feature.properties?.elevationM);
    return [{ type: "Feature" as const, properties: { elevationM, index: elevationM % indexEveryM === 0 }, geometry: { type: "MultiLineString" as const, coordinates: lines } }];
  });
  return { type: "FeatureCollection", features };
}

function dropRepeats(line: Position[]): Position[] {
  return line.filter((p, i) => i === 0 || p[0] !== line[i - 1][0] || p[1] !== line[i - 1][1]);
}
