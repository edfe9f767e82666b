"use client";
/** The rider's display units, saved on their account by a server action. */
import { useActionState } from "react";
import { FormMessage } from "@/components/form-bits";
import { initialFormState } from "@/lib/shared/form-state";
import { updateUnitsAction } from "@/lib/accounts/units-actions";
import { MASS_UNITS, PRESSURE_UNITS } from "@/lib/shared/units";
import { DISTANCE_SYSTEMS, type UnitPrefs } from "@/lib/accounts/pure/units-schema";

const GROUPS = [
  { name: "pressure", legend: "Pressure", options: PRESSURE_UNITS },
  { name: "mass", legend: "Mass", options: MASS_UNITS },
  { name: "distance", legend: "Distance", options: DISTANCE_SYSTEMS },
] as const;

export function UnitsForm({ units }: { units: UnitPrefs }) {
  const [state, action, pending] = useActionState(updateUnitsAction, initialFormState);
  const current = { ...units, ...(state.values ?? {}) } as Record<string, string>;
  return (
    <form action={action} className="card space-y-3" key={JSON.stringify(current)}>
      <h2 className="text-xl font-bold">Units</h2>
      <FormMessage state={state} />
      {GROUPS.map((group) => (
        <fieldset key={group.name}>
          <legend className="label">{group.legend}</legend>
          <div className="flex flex-wrap gap-2">
            {group.options.map((option) => (
              <label key={option} className="btn-quiet has-[:checked]:border-loam-900 has-[:checked]:bg-loam-900 has-[:checked]:text-white has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-moss-600">
                <input type="radio" name={group.name} value={option} defaultChecked={current[group.name] === option} className="sr-only" />
                {option}
              </label>
            ))}
          </div>
          <p className="field-error" aria-live="polite">{state.fieldErrors?.[group.name] ?? ""}</p>
        </fieldset>
      ))}
      <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Saving…" : "Save units"}</button>
    </form>
  );
}
