"use client";
import { useEffect, useRef, useState } from "react";
import { DifficultyBadge } from "@/components/difficulty-badge";
import { StatusLabel } from "@/components/board/status-label";
import { describeFeatures, FEATURE_LABELS, FEATURE_STATE_LABELS, STATUS_LABELS, STATUS_SIGNS } from "@/lib/conditions/pure/labels";
import { applyChange, draftFromStart, type DraftChange, type CheckDraft } from "@/lib/conditions/pure/check-draft";
import { FEATURE_STATES, STATUSES, SURFACES, type FeatureGroup, type ReportStatus, type Surface } from "@/lib/conditions/pure/vocabulary";
import type { CheckTrail } from "@/lib/conditions/morning-check-start";
import { formatCalendarDate } from "@/lib/shared/park-clock";
import { ToggleGroup } from "./toggle-group";

export type TrailMessage = { kind: "problem" | "conflict"; text: string; onAdopt?: () => void };

const MODE_TEXT = { untouched: "Not checked", unchanged: "Unchanged", edited: "Changed" } as const;

/** "Open · tacky, damp · from 1 Dec": what the trail was left as, in one line. */
function lastState(trail: CheckTrail): string {
  if (!trail.start) return "No earlier report: set its status";
  const parts = [trail.start.reason, trail.start.surfaces.join(", "), describeFeatures(trail.start.features)].filter(Boolean);
  return [...parts, trail.inspectedToday ? null : `as of ${formatCalendarDate(trail.startDate!)}`].filter(Boolean).join(" · ");
}

/**
 * One trail of the morning check as a compact row: its last state, then Unchanged (one tap)
 * or Change, which opens status, reason, surfaces, features and a note below the row.
 */
export function CheckTrailRow(props: {
  trail: CheckTrail;
  draft: CheckDraft;
  open: boolean;
  onOpen: (open: boolean) => void;
  onChange: (draft: CheckDraft) => void;
  message?: TrailMessage;
}) {
  const { trail, draft, open } = props;
  const change = (c: DraftChange) => props.onChange(applyChange(draft, c));
  const id = `trail-${trail.id}`;
  const needsReason = draft.status === "caution" || draft.status === "closed";
  // A finger that picks Closed or Caution lands in the reason next: typing it is the next step.
  // Arrow keys moving through the statuses leave the focus where it is.
  const tapped = useRef(false);
  const [focusReason, setFocusReason] = useState(false);
  useEffect(() => {
    if (!focusReason) return;
    document.getElementById(`${id}-reason`)?.focus();
    setFocusReason(false);
  }, [focusReason, id]);
  const pickStatus = (status: ReportStatus) => {
    change({ type: "status", status });
    if (tapped.current && status !== "open") setFocusReason(true);
    tapped.current = false;
  };

  const keepAsBefore = () => {
    props.onChange({ ...draftFromStart(trail.start, draft.baseRevision), mode: draft.mode === "unchanged" ? "untouched" : "unchanged" });
    props.onOpen(false);
  };
  const marked = draft.mode !== "untouched";
  return (
    <li
      id={id}
      tabIndex={-1}
      className={`card scroll-mt-4 space-y-2 p-3 ${marked ? "border-l-4 border-l-loam-800" : ""}`}
      aria-labelledby={`${id}-name`}
      data-testid="check-trail"
      data-trail-name={trail.name}
      data-mode={draft.mode}
      data-last-state={trail.start ? "known" : "none"}
    >
      <div className="flex items-start justify-between gap-2">
        <div className="min-w-0">
          <h2 id={`${id}-name`} className="text-base font-bold leading-tight">
            {trail.name}
          </h2>
          <p className="flex flex-wrap items-center gap-x-2 gap-y-1 text-sm text-loam-700">
            <DifficultyBadge difficulty={trail.difficulty} size={14} />
            <StatusLabel status={draft.mode === "edited" ? draft.status : (trail.start?.status ?? null)} size="sm" />
          </p>
          <p className="mt-0.5 text-sm text-loam-600">{lastState(trail)}</p>
        </div>
        <span className="shrink-0 rounded bg-loam-100 px-2 py-0.5 text-xs font-semibold" data-testid="mode">
          {draft.mode === "untouched" && trail.inspectedToday ? "Checked today" : MODE_TEXT[draft.mode]}
        </span>
      </div>
      {props.message && (
        <div role="alert" className={`rounded-lg p-3 font-semibold ${props.message.kind === "conflict" ? "bg-flare-100" : "bg-brick-100 text-brick-600"}`}>
          <p>{props.message.text}</p>
          {props.message.onAdopt && (
            <button type="button" className="btn-quiet mt-2" onClick={props.message.onAdopt}>
              Start again from their values
            </button>
          )}
        </div>
      )}
      <div className="grid grid-cols-2 gap-2">
        <button
          type="button"
          aria-pressed={draft.mode === "unchanged"}
          disabled={!trail.start}
          className={`btn border-2 ${draft.mode === "unchanged" ? "border-moss-700 bg-moss-600 text-white" : "border-moss-600 bg-white text-moss-700"}`}
          onClick={keepAsBefore}
        >
          {draft.mode === "unchanged" ? "✓ Unchanged" : "Unchanged"}
        </button>
        <button type="button" aria-expanded={open} aria-controls={`${id}-editor`} className="btn-quiet border-2" onClick={() => props.onOpen(!open)}>
          {open ? "Fold away" : "Change"}
        </button>
      </div>
      {open && (
        <div id={`${id}-editor`} className="space-y-3 border-t border-loam-200 pt-3">
          <div onPointerDown={() => (tapped.current = true)}>
          <ToggleGroup
            name={`${id}-status`}
            legend={`Status of ${trail.name}`}
            hideLegend
            type="radio"
            options={STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s], sign: STATUS_SIGNS[s] }))}
            selected={draft.status ? [draft.status] : []}
            onToggle={(value) => pickStatus(value as ReportStatus)}
          />
          </div>
          {needsReason && (
            <div>
              <label htmlFor={`${id}-reason`} className="label">
                Reason ({draft.status === "closed" ? "closed" : "caution"})
              </label>
              <input id={`${id}-reason`} className="field" value={draft.reason} maxLength={200} required onChange={(e) => change({ type: "reason", reason: e.target.value })} />
            </div>
          )}
          <ToggleGroup
            name={`${id}-surfaces`}
            legend="Surfaces"
            type="checkbox"
            columns="grid-cols-3 sm:grid-cols-5"
            options={SURFACES.map((s) => ({ value: s, label: s }))}
            selected={draft.surfaces}
            onToggle={(value, on) => change({ type: "surface", surface: value as Surface, on })}
          />
          <details>
            <summary className="min-h-tap cursor-pointer content-center font-semibold">
              Berms, jumps, wooden features{describeFeatures(draft.features) ? <span className="font-normal text-loam-700">: {describeFeatures(draft.features)}</span> : null}
            </summary>
            <div className="mt-2 space-y-3">
              {(Object.keys(FEATURE_STATES) as FeatureGroup[]).map((kind) => (
                <ToggleGroup
                  key={kind}
                  name={`${id}-${kind}`}
                  legend={FEATURE_LABELS[kind]}
                  type="radio"
                  columns="grid-cols-4"
                  options={[{ value: "", label: "—" }, ...FEATURE_STATES[kind].map((s) => ({ value: s, label: FEATURE_STATE_LABELS[s] }))]}
                  selected={[draft.features[kind] ?? ""]}
                  onToggle={(value) => change({ type: "feature", feature: kind, state: value || null })}
                />
              ))}
            </div>
          </details>
          <details open={Boolean(draft.note)}>
            <summary className="min-h-tap cursor-pointer content-center font-semibold">Note for riders</summary>
            <textarea aria-label={`Note for ${trail.name}`} className="field mt-2 min-h-24 py-2" value={draft.note} maxLength={1000} onChange={(e) => change({ type: "note", note: e.target.value })} />
          </details>
        </div>
      )}
    </li>
  );
}
