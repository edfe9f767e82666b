import { AppError } from "@/lib/shared/errors";

/** A decimal number as GPX writes it (xsd:decimal; an exponent is tolerated). */
const DECIMAL = /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/;

const LABEL = { trkpt: "Track point", rtept: "Route point", wpt: "Waypoint" } as const;
export type PointTag = keyof typeof LABEL;
export const isPointTag = (name: string): name is PointTag => name in LABEL;

function notANumber(tag: PointTag, index: number, what: string, value: string): AppError {
  const shown = value.length > 30 ? `${value.slice(0, 30)}…` : value;
  return new AppError(422, `${LABEL[tag]} ${index + 1} has ${what} "${shown}", which is not a number.`, "file");
}

/**
 * A point's latitude or longitude from its attribute, refused when missing or not a decimal.
 * Lenient readers skip such points silently; we refuse them so nothing is lost unsaid.
 */
export function pointCoordinate(value: string | undefined, attr: "lat" | "lon", tag: PointTag, index: number): number {
  const what = attr === "lat" ? "latitude" : "longitude";
  if (value === undefined) throw new AppError(422, `${LABEL[tag]} ${index + 1} has no ${what} (the "${attr}" attribute is required).`, "file");
  if (!DECIMAL.test(value)) throw notANumber(tag, index, what, value);
  return Number.parseFloat(value);
}

/** The elevation of a point from its <ele> text, refused when it is not a decimal. */
export function pointElevation(text: string, tag: PointTag, index: number): number {
  if (!DECIMAL.test(text)) throw notANumber(tag, index, "elevation", text);
  return Number.parseFloat(text);
}
