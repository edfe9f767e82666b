import { AppError } from "@/lib/shared/errors";
import { singlePointError } from "./geometry-checks";
import { readGpxStream, type GpxRoot } from "./gpx-stream";
import type { RawTrail } from "./types";

const GPX_NAMESPACES = ["http://www.topografix.com/GPX/1/1", "http://www.topografix.com/GPX/1/0"];

/**
 * GPX 1.1 schema: the root is <gpx> with version="1.1" (1.0 has the same trk/rte/wpt shape) and a
 * creator. Some device exports write a bare <gpx> with neither version nor namespace: that one is
 * read as 1.1 with a warning. A version that is missing beside a namespace, or unknown, is refused.
 */
function checkRoot(root: GpxRoot, warnings: string[]): void {
  if (root.local === "kml") throw new AppError(415, "This is a KML file. Loamcast reads GPX 1.1 or GeoJSON: export the trail as GPX from your mapping app.", "file");
  if (root.local === "TrainingCenterDatabase") throw new AppError(415, "This is a TCX workout file. Export the ride as GPX and upload that.", "file");
  if (root.name !== "gpx") throw new AppError(415, `This XML file is not GPX (its root element is <${root.name}>, not <gpx>).`, "file");
  const version = root.version;
  if (!version && !root.uri) {
    warnings.push("The <gpx> element names neither a GPX version nor the GPX namespace; it was read as GPX 1.1.");
  } else if (version !== "1.1" && version !== "1.0") {
    throw new AppError(422, version ? `GPX version ${version.slice(0, 10)} is not supported; export as GPX 1.1.` : 'The <gpx> element has no version; GPX 1.1 requires version="1.1".', "file");
  }
  if (!root.creator) warnings.push("The GPX file does not say which program created it (creator is required by GPX 1.1); it was read anyway.");
  if (root.uri && !GPX_NAMESPACES.includes(root.uri)) warnings.push(`Unexpected GPX namespace ${root.uri}; it was read anyway.`);
}

/**
 * Reads GPX text in one streaming pass: tracks (each trkseg kept separate), else routes, plus
 * waypoints. When a file has both tracks and routes, the recorded track is used and routes are
 * ignored (they are usually the plan of the same line, and adding them would double the length).
 */
export function parseGpx(text: string): RawTrail {
  const warnings: string[] = [];
  const read = readGpxStream(text, (root) => checkRoot(root, warnings));
  for (const { number, directPoints } of read.segmentCounts) {
    if (directPoints === 1) warnings.push(`Track segment ${number} has a single point and was ignored.`);
  }
  const tracks = read.trackLines.filter((entry) => entry.line.length >= 2);
  const routes = read.routes.filter((route) => route.line.length >= 2);
  const hasTracks = tracks.length > 0;
  if (hasTracks && routes.length > 0) warnings.push(`The file also has ${routes.length} route(s); the recorded track was used and the route(s) ignored.`);

  const segments = hasTracks ? tracks.map((entry) => entry.line) : routes.map((route) => route.line);
  // One-point segments and routes are dropped; a file whose only line points were such is a single point.
  if (segments.length === 0 && read.linePoints > 0) throw singlePointError();
  const lineNames = hasTracks ? [...new Set(tracks.map((entry) => entry.track))].map((track) => track.name) : routes.map((route) => route.name);
  return { name: lineNames.find(Boolean) ?? read.metadataName, segments, waypoints: read.waypoints, warnings };
}
