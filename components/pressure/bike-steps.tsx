"use client";
/**
 * A bike typed in on "Today's pressure", one step at a time (`lib/pressure/pure/bike-steps.ts`
 * decides what each step holds and when the rider may go on). The form around it owns the step,
 * so a refusal from the client check or the server can reopen the step that holds the field.
 * Steps already reached stay one click away, each with a line saying what it holds.
 */
import { useEffect, useRef, type ReactNode } from "react";
import { BIKE_STEPS, LAST_BIKE_STEP, stepSummary } from "@/lib/pressure/pure/bike-steps";
import type { DraftErrors, SetupDraft } from "@/lib/setups/pure/setup-form";
import { BaselineFields, RiderFields, WheelFields } from "./setup-fields";

type Props = {
  draft: SetupDraft;
  errors: DraftErrors;
  onChange: (draft: SetupDraft) => void;
  step: number;
  /** The furthest step the rider has reached: every step up to it can be reopened. */
  reached: number;
  onStep: (step: number) => void;
  /** Shown under the last step's fields (e.g. "keep this setup on this device"). */
  lastStepExtra?: ReactNode;
};

export function BikeSteps({ draft, errors, onChange, step, reached, onStep, lastStepExtra }: Props) {
  const heading = useRef<HTMLHeadingElement>(null);
  const shownStep = useRef(step);
  // A new step moves focus to its heading, so a screen reader says where the rider is; the first
  // render leaves focus alone. (Errors then move focus on to the first bad field: the form's effect runs after this one.)
  useEffect(() => {
    if (shownStep.current !== step) heading.current?.focus();
    shownStep.current = step;
  }, [step]);

  const fields = { idPrefix: "setup", draft, errors, onChange };
  return (
    <section aria-labelledby="bike-step-heading" className="space-y-4" data-testid="bike-steps" data-step={BIKE_STEPS[step].id}>
      <ol className="grid gap-2 sm:grid-cols-3" aria-label="Your bike, in three steps">
        {BIKE_STEPS.map((s, i) => {
          const current = i === step;
          const label = (
            <>
              <span className="block font-bold">
                {i + 1}. {s.title}
              </span>
              {i <= reached && !current && <span className="block text-sm text-loam-800">{stepSummary(draft, i)}</span>}
            </>
          );
          return (
            <li key={s.id}>
              {i <= reached && !current ? (
                <button type="button" onClick={() => onStep(i)} className="w-full min-h-tap rounded-lg border-2 border-loam-300 bg-white px-3 py-2 text-left hover:border-loam-900">
                  <span className="sr-only">Change: </span>
                  {label}
                </button>
              ) : (
                <span aria-current={current ? "step" : undefined} className={`block min-h-tap rounded-lg border-2 px-3 py-2 ${current ? "border-loam-900 bg-loam-900 text-white" : "border-dashed border-loam-300 text-loam-700"}`}>
                  {label}
                </span>
              )}
            </li>
          );
        })}
      </ol>
      <h3 id="bike-step-heading" ref={heading} tabIndex={-1} className="text-lg font-bold focus:outline-3 focus:outline-moss-600">
        Step {step + 1} of {BIKE_STEPS.length}: {BIKE_STEPS[step].title}
      </h3>
      {step === 0 && <RiderFields {...fields} />}
      {step === 1 && (
        <>
          <WheelFields {...fields} position="front" />
          <WheelFields {...fields} position="rear" />
        </>
      )}
      {step === 2 && (
        <>
          <BaselineFields {...fields} />
          {lastStepExtra}
        </>
      )}
      <div className="flex flex-wrap gap-2">
        {step > 0 && (
          <button type="button" className="btn-quiet" onClick={() => onStep(step - 1)}>
            Back
          </button>
        )}
        {step < LAST_BIKE_STEP && (
          // A submit button, so Enter in a field goes on to the next step as it would submit a one-page form.
          <button type="submit" className="btn-primary grow">
            Next: {BIKE_STEPS[step + 1].title}
          </button>
        )}
      </div>
    </section>
  );
}
