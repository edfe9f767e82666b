"use client";
/**
 * Controlled, labelled inputs for the rider forms. Every control is a native element (keyboard
 * works as the platform expects); errors are tied to their field and announced politely.
 */
import type { ReactNode } from "react";

type FieldProps = { id: string; label: string; error?: string; hint?: string };

const describedBy = ({ id, error, hint }: FieldProps) => (error ? `${id}-error` : hint ? `${id}-hint` : undefined);

function FieldNote({ id, error, hint }: FieldProps) {
  return (
    <>
      {hint && !error && (
        <p id={`${id}-hint`} className="mt-1 text-sm text-loam-700">
          {hint}
        </p>
      )}
      <p id={`${id}-error`} className="field-error" aria-live="polite">
        {error ?? ""}
      </p>
    </>
  );
}

export function TextInput(props: FieldProps & { value: string; onChange: (value: string) => void; inputMode?: "decimal" | "numeric" | "text"; type?: string; autoComplete?: string }) {
  return (
    <div>
      <label htmlFor={props.id} className="label">
        {props.label}
      </label>
      <input
        id={props.id}
        name={props.id}
        type={props.type ?? "text"}
        inputMode={props.inputMode ?? "decimal"}
        autoComplete={props.autoComplete ?? "off"}
        value={props.value}
        onChange={(e) => props.onChange(e.target.value)}
        aria-invalid={Boolean(props.error)}
        aria-describedby={describedBy(props)}
        className="field text-lg"
      />
      <FieldNote {...props} />
    </div>
  );
}

export function SelectInput<T extends string>(props: FieldProps & { value: T; options: readonly { value: T; label: string }[]; onChange: (value: T) => void }) {
  return (
    <div>
      <label htmlFor={props.id} className="label">
        {props.label}
      </label>
      <select
        id={props.id}
        name={props.id}
        value={props.value}
        onChange={(e) => props.onChange(e.target.value as T)}
        aria-invalid={Boolean(props.error)}
        aria-describedby={describedBy(props)}
        className="field text-lg"
      >
        {props.options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <FieldNote {...props} />
    </div>
  );
}

export function CheckInput({ id, label, checked, onChange, children }: { id: string; label: string; checked: boolean; onChange: (checked: boolean) => void; children?: ReactNode }) {
  return (
    <label htmlFor={id} className="flex min-h-tap cursor-pointer items-center gap-3 rounded-lg border border-loam-300 bg-white px-3 py-2 has-[:checked]:border-moss-600 has-[:checked]:bg-moss-100 has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-moss-600">
      <input id={id} name={id} type="checkbox" checked={checked} onChange={(e) => onChange(e.target.checked)} className="h-6 w-6 shrink-0 accent-moss-600" />
      <span className="font-semibold text-loam-900">{label}</span>
      {children}
    </label>
  );
}

/** A group of radio buttons shown as large segments; arrow keys move between them. */
export function Segments<T extends string>(props: { name: string; legend: string; value: T; options: readonly { value: T; label: string }[]; onChange: (value: T) => void; small?: boolean }) {
  return (
    <fieldset>
      <legend className="label">{props.legend}</legend>
      <div className="flex flex-wrap gap-2">
        {props.options.map((o) => (
          <label
            key={o.value}
            className={`flex min-h-tap min-w-tap cursor-pointer items-center justify-center gap-2 rounded-lg border-2 px-3 font-bold has-[:checked]:border-loam-900 has-[:checked]:bg-loam-900 has-[:checked]:text-white has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-moss-600 border-loam-300 bg-white text-loam-900 ${props.small ? "text-sm" : "text-base"}`}
          >
            <input type="radio" name={props.name} value={o.value} checked={props.value === o.value} onChange={() => props.onChange(o.value)} className="sr-only" />
            {o.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

/** Checkboxes for picking several values of a list (surfaces, symptoms). */
export function MultiCheck<T extends string>(props: { name: string; legend: string; values: readonly T[]; options: readonly { value: T; label: string }[]; onChange: (values: T[]) => void; error?: string }) {
  const toggle = (value: T, on: boolean) => props.onChange(on ? [...props.values, value] : props.values.filter((v) => v !== value));
  return (
    <fieldset aria-describedby={props.error ? `${props.name}-error` : undefined}>
      <legend className="label">{props.legend}</legend>
      <div className="grid grid-cols-2 gap-2 sm:grid-cols-3">
        {props.options.map((o) => (
          <CheckInput key={o.value} id={`${props.name}-${o.value}`} label={o.label} checked={props.values.includes(o.value)} onChange={(on) => toggle(o.value, on)} />
        ))}
      </div>
      <p id={`${props.name}-error`} className="field-error" aria-live="polite">
        {props.error ?? ""}
      </p>
    </fieldset>
  );
}
