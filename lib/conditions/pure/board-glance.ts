/**
 * The board's first glance: "what can I ride today" in one line, and the trails a rider must
 * know about first (changed since yesterday, or not open) ahead of the ones as they were.
 * Free of zod so the board's client code stays small.
 */
import type { ReportStatus } from "./vocabulary";

type Glanceable = { effectiveStatus: ReportStatus | null; changedSinceYesterday: boolean };

export type BoardCounts = { open: number; caution: number; closed: number; notChecked: number };

export function boardCounts(trails: Glanceable[]): BoardCounts {
  const counts: BoardCounts = { open: 0, caution: 0, closed: 0, notChecked: 0 };
  for (const t of trails) {
    if (t.effectiveStatus === null) counts.notChecked++;
    else counts[t.effectiveStatus]++;
  }
  return counts;
}

/** A trail needs a rider's attention first when it changed since yesterday or is anything but open. */
export const needsAttention = (t: Glanceable): boolean => t.changedSinceYesterday || t.effectiveStatus !== "open";

/** The trails split in two, each keeping its order: those needing attention first, then the rest. */
export function firstGlance<T extends Glanceable>(trails: T[]): { attention: T[]; rest: T[] } {
  return { attention: trails.filter(needsAttention), rest: trails.filter((t) => !needsAttention(t)) };
}
