"use client";
/**
 * Big toggle buttons built on native radio buttons and checkboxes: at least 48 px, usable
 * with gloves, and with the keyboard (arrow keys move within a radio group, space toggles).
 */
type Option = { value: string; label: string; sign?: string };

const BASE =
  "relative inline-flex min-h-tap min-w-tap cursor-pointer select-none items-center justify-center gap-1 rounded-lg border-2 px-3 text-base font-semibold " +
  "border-loam-300 bg-white text-loam-800 has-[:checked]:border-loam-900 has-[:checked]:bg-loam-800 has-[:checked]:text-white " +
  "has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-moss-600";

export function ToggleGroup(props: {
  name: string;
  legend: string;
  type: "radio" | "checkbox";
  options: Option[];
  selected: string[];
  onToggle: (value: string, on: boolean) => void;
  columns?: string;
  hideLegend?: boolean;
}) {
  return (
    <fieldset>
      <legend className={props.hideLegend ? "sr-only" : "label"}>{props.legend}</legend>
      <div className={`grid gap-2 ${props.columns ?? "grid-cols-3"}`}>
        {props.options.map((option) => {
          const checked = props.selected.includes(option.value);
          return (
            <label key={option.value} className={BASE}>
              <input
                type={props.type}
                name={props.name}
                value={option.value}
                checked={checked}
                onChange={(e) => props.onToggle(option.value, e.target.checked)}
                // Tapping the status already shown confirms it: the trail counts as inspected.
                onClick={() => props.type === "radio" && checked && props.onToggle(option.value, true)}
                className="absolute h-px w-px opacity-0"
              />
              {option.sign && <span aria-hidden="true">{option.sign}</span>}
              {option.label}
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
