/**
 * The DOM-based GPX reader Loamcast used before the streaming one (lib/trails/pure/parse-gpx.ts),
 * kept under tests only: tests/unit/trails/stream-vs-dom.test.ts checks that both read every
 * fixture alike. Not imported by the app.
 */
import { DOMParser, type Document, type Element } from "@xmldom/xmldom";
import { gpx } from "@tmcw/togeojson";
import type { Feature, FeatureCollection } from "geojson";
import { AppError } from "@/lib/shared/errors";
import { refuseDoctype, refuseTooManyGpxPoints } from "./dom-gpx-guard";
import { firstChild, scanGpxPoints } from "./dom-gpx-points";
import { singlePointError } from "@/lib/trails/pure/geometry-checks";
import type { Position, RawTrail, TrailWaypoint } from "@/lib/trails/pure/types";

const GPX_NAMESPACES = ["http://www.topografix.com/GPX/1/1", "http://www.topografix.com/GPX/1/0"];

function notWellFormed(detail: string): AppError {
  const short = detail.split("\n")[0].slice(0, 160);
  return new AppError(422, `The file is not well-formed XML, so it cannot be read as GPX (${short}).`, "file");
}

/** xmldom 0.9 reports problems through onError; any error, fatal error or warning stops parsing. */
function parseXml(text: string): Document {
  try {
    return new DOMParser({
      locator: false, // line and column numbers on every node cost memory we never use
      onError(level, message) {
        // A literal U+FFFD in the text is harmless; every other warning means malformed markup.
        if (level === "warning" && message.startsWith("Unicode replacement character")) return;
        throw new Error(message);
      },
    }).parseFromString(text, "text/xml");
  } catch (error) {
    throw notWellFormed(error instanceof Error ? error.message.replace(/^.*caused Error: /, "") : String(error));
  }
}

/** GPX 1.1 schema: the root is <gpx> with version="1.1" (1.0 has the same trk/rte/wpt shape) and a creator. */
function checkRoot(doc: Document, warnings: string[]): void {
  const root = doc.documentElement;
  const name = root?.localName ?? "";
  if (name === "kml") throw new AppError(415, "This is a KML file. Loamcast reads GPX 1.1 or GeoJSON: export the trail as GPX from your mapping app.", "file");
  if (name === "TrainingCenterDatabase") throw new AppError(415, "This is a TCX workout file. Export the ride as GPX and upload that.", "file");
  if (!root || root.nodeName !== "gpx") throw new AppError(415, `This XML file is not GPX (its root element is <${root?.nodeName ?? "?"}>, not <gpx>).`, "file");
  const version = root.getAttribute("version");
  if (version !== "1.1" && version !== "1.0") {
    throw new AppError(422, version ? `GPX version ${version.slice(0, 10)} is not supported; export as GPX 1.1.` : 'The <gpx> element has no version; GPX 1.1 requires version="1.1".', "file");
  }
  if (!root.getAttribute("creator")) warnings.push("The GPX file does not say which program created it (creator is required by GPX 1.1); it was read anyway.");
  if (root.namespaceURI && !GPX_NAMESPACES.includes(root.namespaceURI)) warnings.push(`Unexpected GPX namespace ${root.namespaceURI}; it was read anyway.`);
}

function toGeoJson(doc: Document): FeatureCollection {
  try {
    return gpx(doc);
  } catch (error) {
    throw new AppError(422, "The GPX file could not be converted; check that it was exported as GPX 1.1.", "file", String(error));
  }
}

function textOf(value: unknown): string | undefined {
  return typeof value === "string" && value.trim() ? value.trim() : undefined;
}

function metadataName(doc: Document): string | undefined {
  const metadata = doc.getElementsByTagName("metadata")[0];
  const name = metadata ? firstChild(metadata, "name") : null;
  return textOf(name?.textContent);
}

/** The text of an element's first descendant with this name, as the converter reads a track's name. */
const descendantText = (name: string) => (el: Element) => {
  const found = el.getElementsByTagName(name)[0];
  found?.normalize();
  return textOf(found?.textContent);
};

function linesOf(feature: Feature): Position[][] {
  const geometry = feature.geometry;
  if (geometry?.type === "LineString") return [geometry.coordinates];
  if (geometry?.type === "MultiLineString") return geometry.coordinates;
  return [];
}

/**
 * Reads GPX 1.1 text: tracks (each trkseg kept separate), else routes, plus waypoints.
 * When a file has both tracks and routes, the recorded track is used and routes are ignored
 * (they are usually the plan of the same line, and adding them would double the length).
 */
export function parseGpxWithDom(text: string): RawTrail {
  refuseDoctype(text);
  refuseTooManyGpxPoints(text);
  const doc = parseXml(text);
  const warnings: string[] = [];
  checkRoot(doc, warnings);
  const scan = scanGpxPoints(doc.documentElement!);
  warnings.push(...scan.warnings);

  // Tracks were read by the scan; the converter gets the rest (routes, waypoints and their names).
  const trackNames = scan.tracksWithLines.map(descendantText("name"));
  for (const track of scan.trackElements) track.parentNode?.removeChild(track);
  const features = toGeoJson(doc).features;
  const routes = features.filter((f) => f.properties?._gpxType === "rte");
  const hasTracks = scan.trackSegments.length > 0;
  if (hasTracks && routes.length > 0) warnings.push(`The file also has ${routes.length} route(s); the recorded track was used and the route(s) ignored.`);

  const waypoints: TrailWaypoint[] = [];
  for (const f of features) {
    if (f.geometry?.type !== "Point") continue;
    const [lon, lat, ele] = f.geometry.coordinates;
    const name = textOf(f.properties?.name);
    const type = textOf(f.properties?.type) ?? textOf(f.properties?.sym);
    waypoints.push({ ...(name ? { name } : {}), ...(type ? { type } : {}), lon, lat, ...(ele === undefined ? {} : { ele }) });
  }
  const segments = hasTracks ? scan.trackSegments : routes.flatMap(linesOf);
  // The converter drops one-point segments; a file whose only line points were such is a single point.
  if (segments.length === 0 && scan.linePoints > 0) throw singlePointError();
  const lineNames = hasTracks ? trackNames : routes.map((f) => textOf(f.properties?.name));
  return {
    name: lineNames.find(Boolean) ?? metadataName(doc),
    segments,
    waypoints,
    warnings,
  };
}
