import "server-only";
import type { FeatureStates, ReportInput, ReportStatus, Surface } from "@/lib/conditions/pure/schemas";
import type { TrailReport } from "@/models";

/** A report revision as the API returns it. */
export type ReportView = {
  id: string;
  trailId: string;
  date: string;
  revision: number;
  isCurrent: boolean;
  status: ReportStatus;
  reason: string | null;
  surfaces: string[];
  features: FeatureStates;
  note: string | null;
  reporterId: string | null;
  reportedAt: string;
};

export function reportView(r: TrailReport): ReportView {
  return {
    id: r.id,
    trailId: r.trailId,
    date: r.reportDate,
    revision: r.revision,
    isCurrent: r.isCurrent,
    status: r.status,
    reason: r.reason,
    surfaces: r.surfaces,
    features: r.features as FeatureStates,
    note: r.note,
    reporterId: r.reporterId,
    reportedAt: new Date(r.reportedAt).toISOString(),
  };
}

/** The values a new revision copies when a ranger marks a trail "unchanged". */
export const reportValues = (r: TrailReport): ReportInput => ({
  status: r.status,
  reason: r.reason,
  surfaces: r.surfaces as Surface[],
  features: r.features as FeatureStates,
  note: r.note,
});
