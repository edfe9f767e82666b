/**
 * A trail's line as a small SVG drawing for its page, without a map library: longitudes scaled
 * by cos(latitude) (the equirectangular projection, true to shape over a park-sized area),
 * north up, fitted into the box with its proportions kept.
 */
import type { LineString, MultiLineString } from "geojson";

export type LineSketch = { width: number; height: number; path: string; start: [number, number]; end: [number, number] };

const one = (x: number) => Math.round(x * 10) / 10;

export function lineSketch(line: LineString | MultiLineString, width = 320, height = 200, pad = 12): LineSketch | null {
  const parts = line.type === "LineString" ? [line.coordinates] : line.coordinates;
  const all = parts.flat();
  if (all.length < 2) return null;
  const midLat = (Math.min(...all.map((p) => p[1])) + Math.max(...all.map((p) => p[1]))) / 2;
  const k = Math.cos((midLat * Math.PI) / 180);
  const xs = all.map((p) => p[0] * k);
  const ys = all.map((p) => p[1]);
  const [minX, maxX, minY, maxY] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const scale = Math.min((width - 2 * pad) / (maxX - minX || 1), (height - 2 * pad) / (maxY - minY || 1));
  // Centred in the box: the spare room split on both sides.
  const offX = (width - (maxX - minX) * scale) / 2;
  const offY = (height - (maxY - minY) * scale) / 2;
  const at = (p: number[]): [number, number] => [one(offX + (p[0] * k - minX) * scale), one(height - offY - (p[1] - minY) * scale)];
  const path = parts.map((part) => `M${part.map((p) => at(p).join(",")).join("L")}`).join("");
  return { width, height, path, start: at(parts[0][0]), end: at(parts.at(-1)!.at(-1)!) };
}
