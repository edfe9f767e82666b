import { SaxesParser, type SaxesAttributeNS, type SaxesTagNS } from "saxes";
import { AppError } from "@/lib/shared/errors";
import { doctypeRefusal } from "./gpx-guard";
import { isPointTag, pointCoordinate, pointElevation, type PointTag } from "./gpx-points";
import { tooManyPoints } from "./geometry-checks";
import { TRAIL_LIMITS } from "./limits";
import type { Position, TrailWaypoint } from "./types";

/** What the root element says about itself; judged by the caller as soon as it is seen. */
export type GpxRoot = { name: string; local: string; uri: string; version?: string; creator?: string };

type Track = { name?: string };
type Segment = { number: number; directPoints: number; line: Position[]; track: Track | null; depth: number };
type Route = { name?: string; line: Position[]; depth: number };
type OpenPoint = {
  tag: PointTag;
  index: number;
  depth: number;
  lon: number;
  lat: number;
  ele: number | undefined;
  line: Position[] | null;
  waypoint: { name?: string; type?: string; sym?: string } | null;
  eleSeen: boolean;
};
type Capture = { depth: number; parts: string[]; deliver: (text: string) => void };

export type GpxRead = {
  linePoints: number;
  /** Track segments with at least two points, in the order their first point appears. */
  trackLines: Array<{ line: Position[]; track: Track }>;
  /** Every trkseg, numbered in document order, with its count of trkpt children. */
  segmentCounts: Array<{ number: number; directPoints: number }>;
  routes: Array<{ name?: string; line: Position[] }>;
  waypoints: TrailWaypoint[];
  metadataName?: string;
};

function notWellFormed(detail: string): AppError {
  const short = detail.split("\n")[0].slice(0, 160);
  return new AppError(422, `The file is not well-formed XML, so it cannot be read as GPX (${short}).`, "file");
}

const trimmed = (text: string | undefined) => (text && text.trim() ? text.trim() : undefined);
const MAX_POINTS = TRAIL_LIMITS.maxPoints;

/**
 * One streaming pass over GPX text (saxes, no document tree): the root is handed to
 * checkRoot at the first element; every trkpt, rtept and wpt is checked and counted as it
 * arrives, and the parse stops at the first point over the limit. GPX 1.0 and 1.1 share this
 * shape (gpx › trk › trkseg › trkpt, gpx › rte › rtept, gpx › wpt). Names are the text of the
 * first <name> inside a trk, rte or wpt (as the DOM reader did); <ele>, <type> and <sym> are a
 * point's own children. Nothing inside a point is read as another point.
 */
export function readGpxStream(text: string, checkRoot: (root: GpxRoot) => void): GpxRead {
  const parser = new SaxesParser({ xmlns: true });
  const seen: Record<PointTag, number> = { trkpt: 0, rtept: 0, wpt: 0 };
  let pointsSeen = 0;
  const names: string[] = [];
  const tracks: Track[] = [];
  const segments: Segment[] = [];
  const routes: Route[] = [];
  const captures: Capture[] = [];
  const read: GpxRead = { linePoints: 0, trackLines: [], segmentCounts: [], routes: [], waypoints: [] };
  let point: OpenPoint | null = null;
  // A point's <ele> text, gathered without a closure: a large file has one per point.
  let eleDepth = -1;
  let eleText = "";
  let metadataDepth = -1;
  let metadataNamed = false;
  const naming = new Set<Track | Route>();

  const capture = (depth: number, deliver: (text: string) => void) => captures.push({ depth, parts: [], deliver });
  /** The first <name> anywhere inside a track or route names it. */
  const nameFirst = (owner: Track | Route | undefined, depth: number) => {
    if (!owner || owner.name !== undefined || naming.has(owner)) return;
    naming.add(owner);
    capture(depth, (value) => {
      owner.name = trimmed(value);
    });
  };

  function openPoint(tag: PointTag, element: SaxesTagNS, depth: number) {
    const index = seen[tag]++;
    const attributes = element.attributes as Record<string, SaxesAttributeNS | undefined>;
    // Latitude first, as the refusals have always named it.
    const lat = pointCoordinate(attributes.lat?.value, "lat", tag, index);
    const lon = pointCoordinate(attributes.lon?.value, "lon", tag, index);
    if (++pointsSeen > MAX_POINTS) throw tooManyPoints();
    let line: Position[] | null = null;
    if (tag === "trkpt") {
      read.linePoints += 1;
      const segment = segments[segments.length - 1];
      if (segment && names[depth - 1] === "trkseg" && segment.depth === depth - 1) segment.directPoints += 1;
      if (segment?.track) {
        if (segment.line.length === 0) read.trackLines.push({ line: segment.line, track: segment.track });
        line = segment.line;
      }
    } else if (tag === "rtept") {
      read.linePoints += 1;
      line = routes[routes.length - 1]?.line ?? null;
    }
    const waypoint = tag === "wpt" && tracks.length === 0 ? {} : null;
    point = { tag, index, depth, lon, lat, ele: undefined, line, waypoint, eleSeen: false };
  }

  function closePoint(open: OpenPoint) {
    const { lon, lat, ele } = open;
    // Built once its elevation is known: an array grown by one element afterwards takes its
    // length several times over in memory, and a large file keeps 200,000 of them.
    open.line?.push(ele === undefined ? [lon, lat] : [lon, lat, ele]);
    if (open.waypoint) {
      const { name, type, sym } = open.waypoint;
      const kind = trimmed(type) ?? trimmed(sym);
      read.waypoints.push({ ...(name ? { name } : {}), ...(kind ? { type: kind } : {}), lon, lat, ...(ele === undefined ? {} : { ele }) });
    }
  }

  /** Children of an open point: its own <ele>, and a waypoint's <type> and <sym>. */
  function openPointChild(open: OpenPoint, name: string, depth: number) {
    if (depth !== open.depth + 1) return;
    if (name === "ele" && !open.eleSeen) {
      open.eleSeen = true;
      eleDepth = depth;
      eleText = "";
    } else if (open.waypoint && (name === "type" || name === "sym") && open.waypoint[name] === undefined) {
      open.waypoint[name] = "";
      capture(depth, (value) => {
        open.waypoint![name] = value;
      });
    }
  }

  parser.on("doctype", () => {
    throw doctypeRefusal();
  });
  parser.on("error", (error) => {
    // saxes has no event for an entity declaration outside a DOCTYPE; it is a syntax error there.
    const at = text.lastIndexOf("<!", parser.position);
    if (at >= 0 && /^<!(DOCTYPE|ENTITY)/i.test(text.slice(at, at + 9))) throw doctypeRefusal();
    throw notWellFormed(error.message);
  });
  const onText = (value: string) => {
    if (eleDepth >= 0) eleText += value;
    if (captures.length > 0) for (const c of captures) c.parts.push(value);
  };
  parser.on("text", onText);
  parser.on("cdata", onText);

  parser.on("opentag", (element) => {
    const depth = names.length;
    const name = element.name;
    names.push(name);
    if (depth === 0) {
      const attr = (n: string) => (element.attributes[n] as SaxesAttributeNS | undefined)?.value;
      checkRoot({ name, local: element.local, uri: element.uri, version: attr("version"), creator: attr("creator") });
      return;
    }
    if (name === "name") {
      nameFirst(tracks.at(-1) ?? routes.at(-1), depth);
      if (point?.waypoint && point.waypoint.name === undefined) {
        const waypoint = point.waypoint;
        waypoint.name = "";
        capture(depth, (value) => {
          waypoint.name = trimmed(value);
        });
      }
      if (metadataDepth === depth - 1 && !metadataNamed) {
        metadataNamed = true;
        capture(depth, (value) => {
          read.metadataName = trimmed(value);
        });
      }
    }
    if (point) return openPointChild(point, name, depth);
    if (isPointTag(name)) return openPoint(name, element, depth);
    if (name === "trkseg") {
      const segment: Segment = { number: read.segmentCounts.length + 1, directPoints: 0, line: [], track: tracks.at(-1) ?? null, depth };
      segments.push(segment);
      read.segmentCounts.push(segment);
    } else if (name === "trk") {
      tracks.push({});
    } else if (name === "rte" && tracks.length === 0) {
      const route: Route = { line: [], depth };
      routes.push(route);
      read.routes.push(route);
    } else if (name === "metadata" && metadataDepth === -1) {
      metadataDepth = depth;
    }
  });

  parser.on("closetag", (element) => {
    names.pop();
    const depth = names.length;
    while (captures.length > 0 && captures[captures.length - 1].depth === depth) {
      const done = captures.pop()!;
      done.deliver(done.parts.join(""));
    }
    if (point) {
      if (eleDepth === depth) {
        point.ele = pointElevation(eleText, point.tag, point.index);
        eleDepth = -1;
      } else if (point.depth === depth) {
        closePoint(point);
        point = null;
      }
      return;
    }
    const name = element.name;
    if (name === "trkseg" && segments.at(-1)?.depth === depth) segments.pop();
    else if (name === "trk") tracks.pop();
    else if (name === "rte" && routes.at(-1)?.depth === depth) routes.pop();
    else if (name === "metadata" && metadataDepth === depth) metadataDepth = -2;
  });

  parser.write(text).close();
  return read;
}
