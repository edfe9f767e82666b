/** A ride log's stored suggestion and whether it can still be applied (pure, client-safe). */
import type { FeedbackSuggestion } from "@/lib/pressure/pure/feedback";

/** The engine's answer plus what its change applies to: the saved baseline, or what was run (no baseline yet). */
export type StoredSuggestion = FeedbackSuggestion & { appliesTo: "baseline" | "ran" };

/** A setup without a baseline can always take one from the ride; otherwise only a real change applies, once. */
export function canApply(log: { suggestion: StoredSuggestion | null; appliedAt: Date | string | null; setupId: string | null }, setupHasBaseline: boolean) {
  if (!log.suggestion || log.appliedAt || !log.setupId) return false;
  return !setupHasBaseline || log.suggestion.deltaKpa !== 0;
}

type BaselineLike = { frontKpa: number; rearKpa: number };

/**
 * The baseline a suggestion proposes: the pressure run plus the change (newer logs), else the
 * saved baseline plus the change on the wheel named (logs stored before suggestions carried it).
 */
export function proposedBaseline<T extends BaselineLike>(baseline: T, suggestion: StoredSuggestion): T {
  if (!suggestion.wheel) return baseline;
  if (suggestion.proposedKpa) {
    const { frontKpa, rearKpa } = suggestion.proposedKpa;
    return { ...baseline, ...(suggestion.wheel !== "rear" ? { frontKpa } : {}), ...(suggestion.wheel !== "front" ? { rearKpa } : {}) };
  }
  const key = suggestion.wheel === "rear" ? "rearKpa" : "frontKpa";
  return { ...baseline, [key]: baseline[key] + suggestion.deltaKpa };
}
