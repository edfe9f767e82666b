import type { Position, TrailWaypoint } from "./types";

export type ExportableTrail = { name?: string; description?: string; segments: Position[][]; waypoints?: TrailWaypoint[] };

/** Characters XML 1.0 cannot carry at all (controls other than tab, LF, CR; lone surrogates; U+FFFE/FFFF). */
const NOT_XML = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

/** Escapes text for XML element content and double- or single-quoted attributes. */
export function escapeXml(text: string): string {
  return text
    .replace(NOT_XML, "")
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&apos;");
}

/** Plain decimal (GPX uses xsd:decimal, which has no exponent), trailing zeros trimmed. */
function decimal(value: number, digits: number): string {
  const fixed = value.toFixed(digits);
  const trimmed = fixed.includes(".") ? fixed.replace(/0+$/, "").replace(/\.$/, "") : fixed;
  return trimmed === "-0" ? "0" : trimmed;
}

function point(tag: string, [lon, lat, ele]: Position, indent: string, inner = ""): string {
  const eleTag = ele === undefined ? "" : `<ele>${decimal(ele, 2)}</ele>`;
  return `${indent}<${tag} lat="${decimal(lat, 7)}" lon="${decimal(lon, 7)}">${eleTag}${inner}</${tag}>`;
}

const optional = (tag: string, value?: string) => (value ? `<${tag}>${escapeXml(value)}</${tag}>` : "");

/**
 * GPX 1.1 for download: waypoints first, then one track with one trkseg per segment (the order the
 * schema requires). Coordinates to 7 decimals (about 1 cm), elevations to 1 cm.
 */
export function toGpx(trail: ExportableTrail): string {
  const lines = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    '<gpx version="1.1" creator="Loamcast" xmlns="http://www.topografix.com/GPX/1/1" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance" xsi:schemaLocation="http://www.topografix.com/GPX/1/1 http://www.topografix.com/GPX/1/1/gpx.xsd">',
  ];
  if (trail.name || trail.description) lines.push(`  <metadata>${optional("name", trail.name)}${optional("desc", trail.description)}</metadata>`);
  for (const w of trail.waypoints ?? []) {
    const position: Position = w.ele === undefined ? [w.lon, w.lat] : [w.lon, w.lat, w.ele];
    lines.push(point("wpt", position, "  ", `${optional("name", w.name)}${optional("type", w.type)}`));
  }
  lines.push(`  <trk>${optional("name", trail.name)}`);
  for (const segment of trail.segments) {
    // One push per point: spreading 200,000 points into push() overflows the call stack.
    lines.push("    <trkseg>");
    for (const p of segment) lines.push(point("trkpt", p, "      "));
    lines.push("    </trkseg>");
  }
  lines.push("  </trk>", "</gpx>", "");
  return lines.join("\n");
}
