import type { Difficulty } from "@/lib/trails/pure/schemas";
import type { TrailStats } from "./stats";

export type { Difficulty };

/**
 * The trade's difficulty scale (IMBA Trail Difficulty Rating System, Trail Solutions, 2004):
 * white circle, green circle, blue square, black diamond, double black diamond.
 * `colour` is the sign's fill; a white sign needs `outline` to show on a light map.
 */
export const DIFFICULTIES = {
  easiest: { label: "Easiest", symbol: "circle", colour: "#ffffff", colourName: "white", outline: "#1f2937" },
  easy: { label: "Easy", symbol: "circle", colour: "#15803d", colourName: "green", outline: null },
  intermediate: { label: "More difficult", symbol: "square", colour: "#1d4ed8", colourName: "blue", outline: null },
  difficult: { label: "Very difficult", symbol: "diamond", colour: "#111827", colourName: "black", outline: null },
  extreme: { label: "Extremely difficult", symbol: "double-diamond", colour: "#111827", colourName: "black", outline: null },
} as const satisfies Record<Difficulty, { label: string; symbol: string; colour: string; colourName: string; outline: string | null }>;

/** Each grade's sign colour, for map lines and legends: the one place these colours are defined. */
export const DIFFICULTY_COLOURS = Object.fromEntries(Object.entries(DIFFICULTIES).map(([key, d]) => [key, d.colour])) as Record<Difficulty, string>;

export const isDifficulty = (value: string): value is Difficulty => value in DIFFICULTIES;

/** IMBA grade limits, in percent. Average: white < 5, green ≤ 5, blue ≤ 10, black ≤ 15. Maximum: white 10, green 15. */
export const IMBA_GRADE_LIMITS = {
  avg: { easy: 5, intermediate: 10, difficult: 15 },
  max: { easiest: 10, easy: 15 },
} as const;

/**
 * A suggested rating from grades alone: advice for staff, never applied automatically (tread width
 * and obstacles, which the guide also uses, are not in a GPS file). Null without elevation.
 * - easiest: average < 5 % and maximum ≤ 10 %
 * - easy: average ≤ 5 % and maximum ≤ 15 %
 * - intermediate: average ≤ 10 % (or a gentle average with a maximum above 15 %)
 * - difficult: average ≤ 15 %
 * - extreme: average above 15 % (the guide's wording for this level varies between copies)
 */
export function suggestedDifficulty(stats: Pick<TrailStats, "avgGradePct" | "maxGradePct">): Difficulty | null {
  const { avgGradePct: avg, maxGradePct: max } = stats;
  if (avg === null || max === null) return null;
  const { avg: A, max: M } = IMBA_GRADE_LIMITS;
  if (avg < A.easy && max <= M.easiest) return "easiest";
  if (avg <= A.easy && max <= M.easy) return "easy";
  if (avg <= A.intermediate) return "intermediate";
  if (avg <= A.difficult) return "difficult";
  return "extreme";
}
