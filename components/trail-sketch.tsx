import type { LineString, MultiLineString } from "geojson";
import { lineSketch } from "@/lib/trails/pure/line-sketch";

/** The trail's line as a small drawing (north up, start and end marked): no map library, no script. */
export function TrailSketch({ line, name }: { line: LineString | MultiLineString; name: string }) {
  const sketch = lineSketch(line);
  if (!sketch) return null;
  return (
    <svg viewBox={`0 0 ${sketch.width} ${sketch.height}`} role="img" aria-label={`The line of ${name}, north up, from the start (circle) to the end (square)`} className="h-auto w-full max-w-sm rounded-lg bg-loam-100" data-testid="trail-sketch">
      <path d={sketch.path} fill="none" stroke="#ffffff" strokeWidth="7" strokeLinejoin="round" strokeLinecap="round" />
      <path d={sketch.path} fill="none" stroke="#245522" strokeWidth="3.5" strokeLinejoin="round" strokeLinecap="round" />
      <circle cx={sketch.start[0]} cy={sketch.start[1]} r="6" fill="#ffffff" stroke="#221c16" strokeWidth="2" />
      <rect x={sketch.end[0] - 5} y={sketch.end[1] - 5} width="10" height="10" fill="#221c16" />
      <text x={sketch.width - 8} y="16" textAnchor="end" fontSize="13" fill="#4b3d2d">N ↑</text>
    </svg>
  );
}
