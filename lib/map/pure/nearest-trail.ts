import { pointToLineDistance } from "@turf/turf";
import type { Geometry } from "geojson";

export type TappedLine = { id: string; geometry: Geometry };

/**
 * Which of the trails under a tap is the one the finger meant: the nearest line to the tapped
 * point (turf.pointToLineDistance, great-circle metres, which rank the same as screen pixels at
 * one zoom), not the first one the renderer lists within the generous hit area. Lines may come
 * in pieces (tiles cut them); each piece counts for its trail.
 */
export function nearestTrail(lon: number, lat: number, lines: TappedLine[]): string | null {
  let best: { id: string; metres: number } | null = null;
  for (const line of lines) {
    const parts = line.geometry.type === "LineString" ? [line.geometry.coordinates] : line.geometry.type === "MultiLineString" ? line.geometry.coordinates : [];
    for (const coordinates of parts) {
      if (coordinates.length < 2) continue;
      const metres = pointToLineDistance([lon, lat], { type: "LineString", coordinates }, { units: "meters" });
      if (!best || metres < best.metres) best = { id: line.id, metres };
    }
  }
  return best?.id ?? null;
}
