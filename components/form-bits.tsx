"use client";
import { useEffect, useRef } from "react";
import type { FormState } from "@/lib/shared/form-state";

/** A labelled input with its error announced to screen readers. */
export function Field(props: { name: string; label: string; type?: string; state?: FormState; autoComplete?: string; required?: boolean; defaultValue?: string; hint?: string }) {
  const error = props.state?.fieldErrors?.[props.name];
  const id = `field-${props.name}`;
  return (
    <div>
      <label htmlFor={id} className="label">
        {props.label}
      </label>
      <input
        id={id}
        name={props.name}
        type={props.type ?? "text"}
        autoComplete={props.autoComplete}
        required={props.required}
        defaultValue={props.state?.values?.[props.name] ?? props.defaultValue}
        key={props.state?.values?.[props.name] ?? props.defaultValue}
        aria-invalid={Boolean(error)}
        aria-describedby={error ? `${id}-error` : props.hint ? `${id}-hint` : undefined}
        className="field"
      />
      {props.hint && !error && (
        <p id={`${id}-hint`} className="mt-1 text-sm text-loam-600">
          {props.hint}
        </p>
      )}
      <p id={`${id}-error`} className="field-error" aria-live="polite">
        {error ?? ""}
      </p>
    </div>
  );
}

/**
 * The form's outcome, and where the person's attention goes: to the first field that needs
 * attention (by its name), else to this message, brought into view. One pattern for every form.
 */
export function FormMessage({ state }: { state: FormState }) {
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (!state.message && !state.fieldErrors) return;
    const form = ref.current?.closest("form");
    const first = Object.keys(state.fieldErrors ?? {})[0];
    const field = first && form ? form.elements.namedItem(first) : null;
    if (field instanceof HTMLElement) field.focus();
    else ref.current?.scrollIntoView({ block: "nearest" });
  }, [state]);
  return (
    <div ref={ref}>
      {state.message ? (
        <p role={state.ok ? "status" : "alert"} className={`rounded-lg p-3 font-semibold ${state.ok ? "bg-moss-100 text-moss-700" : "bg-brick-100 text-brick-600"}`}>
          {state.message}
        </p>
      ) : (
        <p aria-live="polite" className="sr-only" />
      )}
    </div>
  );
}
