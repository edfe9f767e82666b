import { AppError } from "@/lib/shared/errors";
import type { SourceFormat } from "./types";

const ACCEPTED = "Loamcast reads GPX 1.1 (.gpx) or GeoJSON (.geojson, .json) trail files.";

/** Formats people often try; named so the message can say what to do instead. */
const OTHER_FORMATS: Record<string, string> = {
  ".kml": "a KML file",
  ".kmz": "a KMZ (zipped KML) file",
  ".tcx": "a TCX workout file",
  ".fit": "a FIT activity file",
  ".csv": "a CSV table",
  ".zip": "a ZIP archive",
  ".shp": "a shapefile",
  ".topojson": "a TopoJSON file",
  ".xml": "a generic XML file",
};

const GPX_TYPES = ["application/gpx+xml", "application/gpx", "application/xml", "text/xml"];
const GEOJSON_TYPES = ["application/geo+json", "application/vnd.geo+json", "application/json"];
/** Browsers often send these (or nothing) for .gpx and .geojson files. */
const NEUTRAL_TYPES = ["", "application/octet-stream", "text/plain", "binary/octet-stream"];

const refuse = (message: string) => new AppError(415, message, "file");

function extensionOf(filename: string): string {
  const base = filename.trim().toLowerCase().split(/[\\/]/).pop() ?? "";
  const dot = base.lastIndexOf(".");
  return dot > 0 ? base.slice(dot) : "";
}

/** The format a file claims by its name and declared type; refuses anything else (415). */
export function formatFromName(filename: string, contentType?: string): SourceFormat {
  const ext = extensionOf(filename);
  const type = (contentType ?? "").split(";")[0].trim().toLowerCase();
  if (ext in OTHER_FORMATS) throw refuse(`This is ${OTHER_FORMATS[ext]}. ${ACCEPTED} Export the trail as GPX from your mapping app.`);
  if (type.includes("kml")) throw refuse(`This is a KML file. ${ACCEPTED} Export the trail as GPX from your mapping app.`);
  const format: SourceFormat | undefined = ext === ".gpx" ? "gpx" : ext === ".geojson" || ext === ".json" ? "geojson" : undefined;
  if (!format) {
    throw refuse(ext ? `Files ending in "${ext}" are not trail files. ${ACCEPTED}` : `The file name has no extension. ${ACCEPTED}`);
  }
  const allowed = [...NEUTRAL_TYPES, ...(format === "gpx" ? GPX_TYPES : GEOJSON_TYPES)];
  if (!allowed.includes(type)) {
    const other = format === "gpx" ? GEOJSON_TYPES : GPX_TYPES;
    throw refuse(
      other.includes(type)
        ? `The file is named ${ext} but was sent as ${type}: the name and the content type do not match.`
        : `The file was sent as ${type}, which is not a trail file. ${ACCEPTED}`,
    );
  }
  return format;
}

/** Magic numbers of binary files that get renamed to .gpx or .geojson by mistake. */
const MAGIC: Array<{ bytes: number[]; offset?: number; what: string }> = [
  { bytes: [0x50, 0x4b, 0x03, 0x04], what: "a ZIP archive (a KMZ file, perhaps)" },
  { bytes: [0x1f, 0x8b], what: "a gzip-compressed file" },
  { bytes: [0x89, 0x50, 0x4e, 0x47], what: "a PNG image" },
  { bytes: [0xff, 0xd8, 0xff], what: "a JPEG image" },
  { bytes: [0x25, 0x50, 0x44, 0x46], what: "a PDF document" },
  { bytes: [0x2e, 0x46, 0x49, 0x54], offset: 8, what: "a FIT activity file" },
];

/** Refuses binary content whatever its name says (ASVS 5.2.2: check content, not only the extension). */
export function refuseBinaryContent(bytes: Uint8Array): void {
  for (const magic of MAGIC) {
    const at = magic.offset ?? 0;
    if (bytes.length >= at + magic.bytes.length && magic.bytes.every((b, i) => bytes[at + i] === b)) {
      throw refuse(`This file is ${magic.what}, not a trail. ${ACCEPTED}`);
    }
  }
}

/** Checks that the text's first character fits the claimed format (XML starts with "<", JSON with "{"). */
export function checkContentMatches(format: SourceFormat, text: string): void {
  const first = text.trimStart()[0];
  if (format === "gpx" && (first === "{" || first === "[")) {
    throw refuse("The file is named .gpx but contains JSON. If it is GeoJSON, name it .geojson.");
  }
  if (format === "geojson" && first === "<") {
    throw refuse("The file is named .geojson but contains XML. If it is GPX, name it .gpx.");
  }
}
