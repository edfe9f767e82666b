import type { ParkStateKind, ReportStatus } from "@/lib/conditions/pure/schemas";

export type ActiveParkState = { state: ParkStateKind; message: string } | null;

/**
 * A park-wide state overrides each trail's own status while it lasts: a closed park or a
 * delayed opening shows every trail as closed; an advisory only adds a banner.
 */
export function effectiveStatus(trailStatus: ReportStatus | null, parkState: ActiveParkState): ReportStatus | null {
  if (parkState?.state === "closed" || parkState?.state === "delayed") return "closed";
  return trailStatus;
}

/** Is a park state in force at `now`: started, not ended, not cleared. */
export function isStateActive(s: { startsAt: Date; endsAt: Date | null; clearedAt: Date | null }, now: Date): boolean {
  return !s.clearedAt && s.startsAt <= now && (!s.endsAt || s.endsAt > now);
}
