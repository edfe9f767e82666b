"use client";
import { DifficultyMark } from "@/components/board/difficulty-mark";
import { describeFeatures, FEATURE_LABELS, FEATURE_STATE_LABELS, STATUS_LABELS, STATUS_SIGNS } from "@/lib/conditions/pure/labels";
import { applyChange, type DraftChange, type CheckDraft } from "@/lib/conditions/pure/check-draft";
import { FEATURE_STATES, STATUSES, SURFACES, type FeatureKind, type Surface } from "@/lib/conditions/pure/vocabulary";
import type { CheckTrail } from "@/lib/conditions/morning-check-start";
import { ToggleGroup } from "./toggle-group";

export type TrailMessage = { kind: "problem" | "conflict"; text: string; onAdopt?: () => void };

const MODE_TEXT = { untouched: "Not marked", unchanged: "Unchanged", edited: "Edited" } as const;

/** One trail of the check: "unchanged" in one tap, or status, reason, surfaces, features and a note. */
export function CheckTrailRow(props: { trail: CheckTrail; draft: CheckDraft; onChange: (draft: CheckDraft) => void; message?: TrailMessage }) {
  const { trail, draft } = props;
  const change = (c: DraftChange) => props.onChange(applyChange(draft, c));
  const id = `trail-${trail.id}`;
  const featureLine = describeFeatures(draft.features);
  const startFrom = trail.start ? (trail.inspectedToday ? "today's report" : `the report of ${trail.startDate}`) : null;
  return (
    <li className={`card space-y-3 ${draft.mode !== "untouched" ? "border-2 border-loam-800" : ""}`} aria-labelledby={`${id}-name`} data-testid="check-trail" data-trail-name={trail.name}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h2 id={`${id}-name`} className="text-lg font-bold">
            {trail.name}
          </h2>
          <p className="text-sm text-loam-600">
            <DifficultyMark difficulty={trail.difficulty} /> · {startFrom ? `starting from ${startFrom}` : "no earlier report"}
            {trail.inspectedToday && " · inspected today"}
          </p>
        </div>
        <span className="rounded bg-loam-100 px-2 py-1 text-sm font-semibold" data-testid="mode">
          {MODE_TEXT[draft.mode]}
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
      {trail.start && (
        <button
          type="button"
          aria-pressed={draft.mode === "unchanged"}
          className={`btn w-full border-2 ${draft.mode === "unchanged" ? "border-moss-700 bg-moss-600 text-white" : "border-moss-600 bg-white text-moss-700"}`}
          onClick={() => props.onChange({ ...draft, mode: draft.mode === "unchanged" ? "untouched" : "unchanged" })}
        >
          {draft.mode === "unchanged" ? "✓ Unchanged — kept as before" : "Unchanged"}
        </button>
      )}
      <ToggleGroup
        name={`${id}-status`}
        legend={`Status of ${trail.name}`}
        hideLegend
        type="radio"
        options={STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s], sign: STATUS_SIGNS[s] }))}
        selected={draft.status ? [draft.status] : []}
        onToggle={(value) => change({ type: "status", status: value as (typeof STATUSES)[number] })}
      />
      {draft.status && draft.status !== "open" && (
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
          Berms, jumps, wooden features{featureLine ? <span className="font-normal text-loam-700">: {featureLine}</span> : null}
        </summary>
        <div className="mt-2 space-y-3">
          {(Object.keys(FEATURE_STATES) as FeatureKind[]).map((kind) => (
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
    </li>
  );
}
