import type { Element, Node } from "@xmldom/xmldom";
import { AppError } from "@/lib/shared/errors";
import { TRAIL_LIMITS } from "@/lib/trails/pure/limits";
import { tooManyPoints } from "@/lib/trails/pure/geometry-checks";
import type { Position } from "@/lib/trails/pure/types";

/** A decimal number as GPX writes it (xsd:decimal; an exponent is tolerated). */
const DECIMAL = /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/;

const LABEL = { trkpt: "Track point", rtept: "Route point", wpt: "Waypoint" } as const;
type PointTag = keyof typeof LABEL;
const isPointTag = (name: string): name is PointTag => name in LABEL;

export function firstChild(el: Element, name: string): Element | null {
  for (let node = el.firstChild; node; node = node.nextSibling) {
    if (node.nodeType === 1 && node.nodeName === name) return node as Element;
  }
  return null;
}

function notANumber(tag: PointTag, index: number, what: string, value: string): AppError {
  const shown = value.length > 30 ? `${value.slice(0, 30)}…` : value;
  return new AppError(422, `${LABEL[tag]} ${index + 1} has ${what} "${shown}", which is not a number.`, "file");
}

function checkPoint(el: Element, tag: PointTag, index: number): void {
  for (const attr of ["lat", "lon"] as const) {
    const what = attr === "lat" ? "latitude" : "longitude";
    const value = el.getAttribute(attr);
    if (value === null) throw new AppError(422, `${LABEL[tag]} ${index + 1} has no ${what} (the "${attr}" attribute is required).`, "file");
    if (!DECIMAL.test(value)) throw notANumber(tag, index, what, value);
  }
  const ele = firstChild(el, "ele");
  if (ele && !DECIMAL.test(ele.textContent ?? "")) throw notANumber(tag, index, "elevation", ele.textContent ?? "");
}

function countChildren(el: Element, name: string): number {
  let count = 0;
  for (let node = el.firstChild; node; node = node.nextSibling) if (node.nodeName === name) count++;
  return count;
}

/** The nearest ancestor with this name, or null. */
function ancestor(node: Node, name: string): Node | null {
  let at = node.parentNode;
  while (at && at.nodeName !== name) at = at.parentNode;
  return at;
}

/** [lon, lat, ele?] of a point whose attributes and elevation checkPoint has already accepted. */
function positionOf(el: Element): Position {
  const position: Position = [Number.parseFloat(el.getAttribute("lon")!), Number.parseFloat(el.getAttribute("lat")!)];
  const ele = firstChild(el, "ele");
  if (ele) position.push(Number.parseFloat(ele.textContent ?? ""));
  return position;
}

export type GpxScan = {
  linePoints: number;
  warnings: string[];
  /** Every trkseg of every trk with at least two points, in document order (what the converter would give). */
  trackSegments: Position[][];
  /** The <trk> elements, so the caller can leave them out of the slower conversion. */
  trackElements: Element[];
  /** The <trk> elements that gave at least one segment, in document order (for the trail's name). */
  tracksWithLines: Element[];
};

/**
 * One pass over the document (no allocation per node, unlike getElementsByTagName) that checks
 * every point's lat, lon and ele before conversion. The converter silently skips points whose
 * coordinates do not parse; we refuse them instead, so nothing is lost without a word. Also the
 * second of the two point-count checks, and notes one-point segments the converter will drop.
 * Track points are read here too: togeojson's per-point lookups made it the slowest step of a
 * large file, so it is left the routes and waypoints only.
 */
export function scanGpxPoints(root: Element): GpxScan {
  const seen: Record<PointTag, number> = { trkpt: 0, rtept: 0, wpt: 0 };
  const warnings: string[] = [];
  const segmentsByNode = new Map<Node, { track: Node; line: Position[] }>();
  const trackElements: Element[] = [];
  let segments = 0;
  let node: Node | null = root;
  while (node) {
    let descend = node.nodeType === 1;
    if (descend) {
      const name = node.nodeName;
      if (isPointTag(name)) {
        checkPoint(node as Element, name, seen[name]++);
        if (seen.trkpt + seen.rtept + seen.wpt > TRAIL_LIMITS.maxPoints) throw tooManyPoints();
        if (name === "trkpt") {
          // As the converter reads tracks: points of a trkseg that lies inside a trk.
          const segment = ancestor(node, "trkseg");
          const track = segment && ancestor(segment, "trk");
          if (segment && track) {
            const entry = segmentsByNode.get(segment) ?? { track, line: [] };
            if (entry.line.length === 0) segmentsByNode.set(segment, entry);
            entry.line.push(positionOf(node as Element));
          }
        }
        descend = false; // nothing inside a point but its own fields
      } else if (name === "trkseg") {
        segments += 1;
        if (countChildren(node as Element, "trkpt") === 1) warnings.push(`Track segment ${segments} has a single point and was ignored.`);
      } else if (name === "trk") {
        trackElements.push(node as Element);
      }
    }
    if (descend && node.firstChild) {
      node = node.firstChild;
      continue;
    }
    while (node && node !== root && !node.nextSibling) node = node.parentNode;
    node = node && node !== root ? node.nextSibling : null;
  }
  const kept = [...segmentsByNode.values()].filter((entry) => entry.line.length >= 2);
  const tracksWithLines = [...new Set(kept.map((entry) => entry.track))] as Element[];
  return { linePoints: seen.trkpt + seen.rtept, warnings, trackSegments: kept.map((entry) => entry.line), trackElements, tracksWithLines };
}
