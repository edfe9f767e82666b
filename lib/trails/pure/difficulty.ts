import type { Difficulty } from "@/lib/trails/pure/schemas";
import type { TrailStats } from "./stats";

export type { Difficulty };

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
