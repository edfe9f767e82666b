/**
 * the morning-check screen's working state for one trail, and the request entry it becomes.
 * Pure and zod-free: the screen imports it, unit tests check it.
 */
import type { FeatureGroup, FeatureStates, ReportStatus, Surface } from "./vocabulary";

export type DraftMode = "untouched" | "unchanged" | "edited";
export type CheckDraft = {
  mode: DraftMode;
  baseRevision: number;
  status: ReportStatus | null;
  reason: string;
  surfaces: Surface[];
  features: FeatureStates;
  note: string;
};

export type StartValues = { status: ReportStatus; reason: string | null; surfaces: readonly string[]; features: FeatureStates; note: string | null } | null;

/** The values offered at the start: the last report's, or blank. */
export function draftFromStart(start: StartValues, baseRevision: number): CheckDraft {
  return {
    mode: "untouched",
    baseRevision,
    status: start?.status ?? null,
    reason: start?.reason ?? "",
    surfaces: [...((start?.surfaces ?? []) as Surface[])],
    features: { ...(start?.features ?? {}) },
    note: start?.note ?? "",
  };
}

export type DraftChange =
  | { type: "status"; status: ReportStatus }
  | { type: "reason"; reason: string }
  | { type: "surface"; surface: Surface; on: boolean }
  | { type: "feature"; feature: FeatureGroup; state: string | null }
  | { type: "note"; note: string };

/** Any control touched makes the trail "edited"; moving to open clears the reason. */
export function applyChange(draft: CheckDraft, change: DraftChange): CheckDraft {
  const next: CheckDraft = { ...draft, mode: "edited" };
  switch (change.type) {
    case "status":
      return { ...next, status: change.status, reason: change.status === "open" ? "" : draft.reason };
    case "reason":
      return { ...next, reason: change.reason };
    case "surface": {
      const others = draft.surfaces.filter((s) => s !== change.surface);
      return { ...next, surfaces: change.on ? [...others, change.surface] : others };
    }
    case "feature": {
      const features = { ...draft.features } as Record<string, string | undefined>;
      if (change.state) features[change.feature] = change.state;
      else delete features[change.feature];
      return { ...next, features: features as FeatureStates };
    }
    case "note":
      return { ...next, note: change.note };
  }
}

export type CheckRequestEntry =
  | { trailId: string; baseRevision: number; unchanged: true }
  | { trailId: string; baseRevision: number; report: { status: ReportStatus | null; reason?: string; surfaces: Surface[]; features: FeatureStates; note?: string } };

/** What the check request carries for a trail, or null when the ranger did not mark it. */
export function entryFromDraft(trailId: string, draft: CheckDraft): CheckRequestEntry | null {
  if (draft.mode === "untouched") return null;
  if (draft.mode === "unchanged") return { trailId, baseRevision: draft.baseRevision, unchanged: true };
  const reason = draft.reason.trim();
  const note = draft.note.trim();
  return {
    trailId,
    baseRevision: draft.baseRevision,
    report: { status: draft.status, ...(reason ? { reason } : {}), surfaces: draft.surfaces, features: draft.features, ...(note ? { note } : {}) },
  };
}

/** What the check screen knows about a trail besides its draft. */
export type CheckRowFacts = { id: string; inspectedToday: boolean; hasStart: boolean };

/** A trail counts as checked today when it already has today's report or is marked in this check. */
export const isChecked = (trail: CheckRowFacts, draft: CheckDraft): boolean => trail.inspectedToday || draft.mode !== "untouched";

/**
 * "Mark the rest unchanged": every trail not yet checked today that has a report to keep.
 * Trails without any earlier report stay as they are (there is nothing to keep), and so do
 * trails already checked or marked: the ranger's own marks are never overwritten.
 */
export function markRestUnchanged(trails: CheckRowFacts[], drafts: Record<string, CheckDraft>): Record<string, CheckDraft> {
  const next = { ...drafts };
  for (const trail of trails) {
    if (trail.hasStart && !isChecked(trail, drafts[trail.id])) next[trail.id] = { ...drafts[trail.id], mode: "unchanged" };
  }
  return next;
}

/** The trails "Mark the rest unchanged" would mark. */
export const restToMark = (trails: CheckRowFacts[], drafts: Record<string, CheckDraft>): number =>
  trails.filter((t) => t.hasStart && !isChecked(t, drafts[t.id])).length;
