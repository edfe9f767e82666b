"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/form-bits";
import { clearParkStateAction, setParkStateAction } from "@/lib/conditions/actions";
import { initialFormState } from "@/lib/shared/form-state";
import { PARK_STATE_LABELS } from "@/lib/conditions/pure/labels";
import { PARK_STATES } from "@/lib/conditions/pure/vocabulary";

type Active = { state: string; message: string; endsAt: string | null } | null;

/** Set or clear the park-wide state ("whole park closed: lightning", "opens at 10:00"). */
export function ParkStateForm({ parkSlug, active }: { parkSlug: string; active: Active }) {
  const [state, setAction, setting] = useActionState(setParkStateAction, initialFormState);
  const [cleared, clearAction, clearing] = useActionState(clearParkStateAction, initialFormState);
  return (
    <>
      {/* Outside the panel: after clearing, the panel folds and its clear form is gone. */}
      <FormMessage state={cleared} />
      <details className="card" open={Boolean(active)}>
        <summary className="min-h-tap cursor-pointer content-center text-lg font-bold">Park-wide notice{active ? `: ${PARK_STATE_LABELS[active.state as keyof typeof PARK_STATE_LABELS]}` : ""}</summary>
        <div className="mt-3 space-y-4">
          {active && (
            <form action={clearAction} className="space-y-2">
              <p>
                In force: <strong>{active.message}</strong>
              </p>
              <input type="hidden" name="parkSlug" value={parkSlug} />
              <button type="submit" className="btn-quiet w-full" disabled={clearing}>
                Clear the park-wide notice
              </button>
            </form>
          )}
          <form action={setAction} className="space-y-3">
            <FormMessage state={state} />
            <input type="hidden" name="parkSlug" value={parkSlug} />
            <fieldset>
              <legend className="label">What riders should know</legend>
              <div className="grid grid-cols-1 gap-2 sm:grid-cols-3">
                {PARK_STATES.map((kind) => (
                  <label key={kind} className="btn-quiet has-[:checked]:border-loam-900 has-[:checked]:bg-loam-800 has-[:checked]:text-white">
                    <input type="radio" name="state" value={kind} defaultChecked={kind === "advisory"} className="h-5 w-5 shrink-0" />
                    {PARK_STATE_LABELS[kind]}
                  </label>
                ))}
              </div>
            </fieldset>
            <div>
              <label htmlFor="park-state-message" className="label">
                Message
              </label>
              <input id="park-state-message" name="message" className="field" maxLength={300} required placeholder="Lightning on the ridge: lifts stopped" defaultValue={state.values?.message} />
              <p className="field-error" aria-live="polite">{state.fieldErrors?.message ?? ""}</p>
            </div>
            <div>
              <label htmlFor="park-state-until" className="label">
                Until (park time, optional)
              </label>
              <input id="park-state-until" name="until" type="time" className="field" defaultValue={state.values?.until} />
              <p className="field-error" aria-live="polite">{state.fieldErrors?.until ?? ""}</p>
            </div>
            <button type="submit" className="btn-primary w-full" disabled={setting}>
              Set park-wide notice
            </button>
          </form>
        </div>
      </details>
    </>
  );
}
