/**
 * The one vocabulary for a trail's difficulty, kind and direction: every screen (board, map,
 * trail list, trail page, morning check, history, forms) takes its words and signs from here.
 */
import type { Difficulty, TrailKind } from "./schemas";

export type { Difficulty, TrailKind };

/**
 * The trade's difficulty scale (IMBA Trail Difficulty Rating System, Trail Solutions, 2004):
 * white circle, green circle, blue square, black diamond, double black diamond, with its words.
 * `colour` is the sign's fill; a white sign needs `outline` to show on a light map. `signName`
 * says the sign in words, so the two black grades read apart without the picture.
 */
export const DIFFICULTIES = {
  easiest: { label: "Easiest", symbol: "circle", colour: "#ffffff", colourName: "white", signName: "white circle", outline: "#1f2937" },
  easy: { label: "Easy", symbol: "circle", colour: "#15803d", colourName: "green", signName: "green circle", outline: null },
  intermediate: { label: "More difficult", symbol: "square", colour: "#1d4ed8", colourName: "blue", signName: "blue square", outline: null },
  difficult: { label: "Very difficult", symbol: "diamond", colour: "#111827", colourName: "black", signName: "black diamond", outline: null },
  extreme: { label: "Extremely difficult", symbol: "double-diamond", colour: "#111827", colourName: "black", signName: "double black diamond", outline: null },
} as const satisfies Record<Difficulty, { label: string; symbol: string; colour: string; colourName: string; signName: string; outline: string | null }>;

/** Each grade's sign colour, for map lines and legends: the one place these colours are defined. */
export const DIFFICULTY_COLOURS = Object.fromEntries(Object.entries(DIFFICULTIES).map(([key, d]) => [key, d.colour])) as Record<Difficulty, string>;

export const isDifficulty = (value: string): value is Difficulty => value in DIFFICULTIES;

/** The words for a grade; an unknown value is shown as it is. */
export const difficultyLabel = (value: string): string => (isDifficulty(value) ? DIFFICULTIES[value].label : value);

/** What kind of riding a trail is. "Downhill" is a kind; a trail's direction is worded apart ("ridden downhill"). */
export const TRAIL_KINDS: Record<TrailKind, { label: string }> = {
  flow: { label: "Flow" },
  jump: { label: "Jump line" },
  technical: { label: "Technical" },
  climb: { label: "Climb" },
  "cross-country": { label: "Cross-country" },
  downhill: { label: "Downhill" },
};

export const kindLabel = (value: string): string => TRAIL_KINDS[value as TrailKind]?.label ?? value;

/** The way a trail is ridden, as a phrase that reads after the kind: "Flow · ridden downhill". */
export const DIRECTION_LABELS: Record<string, string> = { downhill: "Ridden downhill", uphill: "Ridden uphill", both: "Ridden both ways" };

export const directionLabel = (value: string): string => DIRECTION_LABELS[value] ?? value;
