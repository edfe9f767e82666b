import type { ReportStatus } from "@/lib/conditions/pure/schemas";

/** What a rider compares: a trail's status and surfaces on one day (null when not inspected). */
export type DaySnapshot = { status: ReportStatus; surfaces: readonly string[] } | null;

export type DayChanges = {
  changed: boolean;
  status: { from: ReportStatus; to: ReportStatus } | null;
  surfacesAdded: string[];
  surfacesRemoved: string[];
};

const NONE: DayChanges = { changed: false, status: null, surfacesAdded: [], surfacesRemoved: [] };

/**
 * What changed since yesterday: the status or the set of surfaces differ (order does not matter).
 * With no report today or none yesterday there is nothing to compare, so nothing "changed".
 */
export function changesSinceYesterday(today: DaySnapshot, yesterday: DaySnapshot): DayChanges {
  if (!today || !yesterday) return NONE;
  const before = new Set(yesterday.surfaces);
  const after = new Set(today.surfaces);
  const surfacesAdded = [...after].filter((s) => !before.has(s));
  const surfacesRemoved = [...before].filter((s) => !after.has(s));
  const status = today.status === yesterday.status ? null : { from: yesterday.status, to: today.status };
  return { changed: Boolean(status) || surfacesAdded.length > 0 || surfacesRemoved.length > 0, status, surfacesAdded, surfacesRemoved };
}
