import { DIFFICULTIES } from "@/lib/trails/pure/vocabulary";
import { difficultyValues, type Difficulty } from "@/lib/trails/pure/schemas";

/**
 * Colours of our own base map: warm paper and earth tones, kept clear of the trail colours
 * (the trade's green, blue and black) so the trails stand out and tests can find them by colour.
 */
export const BASE_COLOURS = {
  land: "#ebe7de",
  parkFill: "#f6f3ec",
  boundary: "#7c6749",
  contour: "#c9b99f",
  contourIndex: "#9a8565",
  contourLabel: "#7c6749",
  roadCasing: "#9a8565",
  road: "#fffdf8",
  lift: "#342b21",
  landmark: "#342b21",
  text: "#221c16",
  halo: "#ffffff",
  hazard: "#f2b12c",
  hazardStroke: "#221c16",
  feature: "#ffffff",
  featureStroke: "#342b21",
} as const;

/** A trail line's colour: the fill of its difficulty sign (white, green, blue, black). */
export const trailColour = (difficulty: Difficulty): string => DIFFICULTIES[difficulty].colour;

/**
 * The casing under a trail line: dark under white lines (which would vanish on a light map),
 * a light halo under the others so dashes and dots stay readable over contours and roads.
 */
export const trailCasing = (difficulty: Difficulty): string => DIFFICULTIES[difficulty].outline ?? "#ffffff";

/** `["match", ["get", "difficulty"], …]` over every difficulty, with a fallback. */
export function difficultyMatch(valueOf: (d: Difficulty) => string, fallback: string): unknown[] {
  return ["match", ["get", "difficulty"], ...difficultyValues.flatMap((d) => [d, valueOf(d)]), fallback];
}
