"use client";
/**
 * "Today's pressure": the day (park, trails) and the setup → POST /api/pressure → the band. A
 * saved setup computes at once, and again whenever the day changes; a bike typed in computes on
 * submit, asked in three steps (`BikeSteps`). The band sits beside the form on a desktop and above
 * it on a phone; errors sit beside their fields, the step holding the first one opens, and focus
 * moves to it. An unsaved setup can be kept in this browser only.
 */
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState, useTransition } from "react";
import { STANDARD_CAUTIONS } from "@/lib/pressure/pure/cautions";
import type { PressureAnswer } from "@/lib/pressure/pressure-today";
import { PRESSURE_UNITS, type MassUnit, type PressureUnit } from "@/lib/shared/units";
import { emptyDayDraft, pressureFieldFor, pressureRequestFrom, type DayDraft } from "@/lib/pressure/pure/pressure-form";
import { emptySetupDraft, setupDraftSchema, type DraftErrors, type SetupDraft } from "@/lib/setups/pure/setup-form";
import { LAST_BIKE_STEP, checkStep, firstStepWithError } from "@/lib/pressure/pure/bike-steps";
import { BandResult, Cautions } from "./band-result";
import { BikeSteps } from "./bike-steps";
import { DayFields, type ParkOption, type TrailOption } from "./day-fields";
import { CheckInput, Segments } from "./inputs";

export type SetupOption = { id: string; name: string; summary: string };
type Props = {
  parks: ParkOption[];
  park: ParkOption | null;
  trails: TrailOption[];
  anyReport: boolean;
  defaultTrailIds: string[];
  setups: SetupOption[];
  signedIn: boolean;
  units: { pressure: PressureUnit; mass: MassUnit };
  initialSetupId?: string;
};

const STORE = { setup: "loamcast.pressure.setup" };

export function PressureForm(props: Props) {
  const router = useRouter();
  const [loadingPark, startParkChange] = useTransition();
  const [setupId, setSetupId] = useState<string | null>(props.initialSetupId ?? props.setups[0]?.id ?? null);
  const [draft, setDraft] = useState<SetupDraft>(() => emptySetupDraft(props.units));
  const [remember, setRemember] = useState(false);
  const [unit, setUnit] = useState<PressureUnit>(props.units.pressure);
  const [day, setDay] = useState<DayDraft>(() => emptyDayDraft(props.park?.slug ?? null, props.defaultTrailIds));
  const [errors, setErrors] = useState<DraftErrors>({});
  /** The step of a bike typed in that is open, and the furthest one reached. */
  const [step, setStep] = useState(0);
  const [reached, setReached] = useState(0);
  const [message, setMessage] = useState<string | null>(null);
  const [answer, setAnswer] = useState<PressureAnswer | null>(null);
  /** A rider's own submit in flight (the button says so and waits); a band computed at once never touches the button. */
  const [busy, setBusy] = useState(false);
  const [computing, setComputing] = useState(false);
  const resultHeading = useRef<HTMLHeadingElement>(null);
  const formRef = useRef<HTMLFormElement>(null);
  /** Only a rider's own submit moves focus to the band; a band computed at once leaves focus where it is. */
  const focusResult = useRef(false);

  // A setup kept on this device (anonymous riders only), read once after the first render.
  const { signedIn } = props;
  useEffect(() => {
    if (signedIn) return;
    try {
      const saved = setupDraftSchema.safeParse(JSON.parse(localStorage.getItem(STORE.setup) ?? "null"));
      if (saved.success) {
        // A bike kept on this device has been through every step: open the last, ready to submit.
        setDraft(saved.data);
        setRemember(true);
        setStep(LAST_BIKE_STEP);
        setReached(LAST_BIKE_STEP);
      }
    } catch {
      // Storage blocked or damaged: start from an empty form.
    }
  }, [signedIn]);

  // The server page re-renders with another park's trails: pick that park's defaults.
  const parkSlug = props.park?.slug ?? null;
  const defaults = props.defaultTrailIds.join(",");
  useEffect(() => {
    setDay((d) => (d.parkSlug === parkSlug && d.trailIds.length ? d : { ...d, parkSlug, trailIds: defaults ? defaults.split(",") : [] }));
  }, [parkSlug, defaults]);

  useEffect(() => {
    if (answer && focusResult.current) resultHeading.current?.focus();
    focusResult.current = false;
  }, [answer]);

  // Errors sit beside their fields; focus moves to the first one.
  useEffect(() => {
    if (Object.keys(errors).length === 0) return;
    formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
  }, [errors]);

  // A saved setup goes straight to today's band, and follows the day as it changes.
  // (computeLatest always holds this render's compute; the effect runs when the answer's inputs change.)
  const computeLatest = useRef<(byRider: boolean) => Promise<void>>(async () => {});
  const trailKey = day.trailIds.join(",");
  useEffect(() => {
    if (setupId) void computeLatest.current(false);
  }, [setupId, day.parkSlug, trailKey, unit]);

  function changePark(slug: string) {
    setDay((d) => ({ ...d, parkSlug: slug || null, trailIds: [] }));
    startParkChange(() => router.replace(slug ? `/pressure?park=${encodeURIComponent(slug)}` : "/pressure?park=none", { scroll: false }));
  }

  function keepOnDevice() {
    try {
      if (!props.signedIn && !setupId) {
        if (remember) localStorage.setItem(STORE.setup, JSON.stringify(draft));
        else localStorage.removeItem(STORE.setup);
      }
    } catch {
      // Not kept; nothing else depends on it.
    }
  }

  function openStep(next: number) {
    setStep(next);
    setReached((r) => Math.max(r, next));
  }

  /** Opens the step holding the first of `found` (a bike typed in only); the day's fields are always shown. */
  function showErrors(found: DraftErrors) {
    setErrors(found);
    const at = setupId ? null : firstStepWithError(found);
    if (at !== null) setStep(at);
  }

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (!setupId && step < LAST_BIKE_STEP) {
      const checked = checkStep(draft, step);
      setErrors(checked.errors);
      setMessage(Object.keys(checked.errors).length ? "Check the highlighted fields." : null);
      openStep(checked.next);
      return;
    }
    await compute(true);
  }

  async function compute(byRider: boolean) {
    setMessage(null);
    // A setup typed by hand is shown in the unit it was typed in: one switch, not two.
    const built = pressureRequestFrom({ setupId, draft, day, unit: setupId ? unit : draft.pressureUnit });
    if (!built.ok) {
      showErrors(built.errors);
      setMessage("Check the highlighted fields.");
      return;
    }
    setErrors({});
    (byRider ? setBusy : setComputing)(true);
    try {
      const response = await fetch("/api/pressure", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(built.body) });
      const body = await response.json();
      if (!response.ok) {
        const field = body?.error?.field as string | undefined;
        if (field) showErrors({ [pressureFieldFor(field)]: body.error.message });
        setMessage(body?.error?.message ?? "Something went wrong. Nothing you typed was lost.");
        return;
      }
      keepOnDevice();
      focusResult.current = byRider;
      setAnswer(body as PressureAnswer);
    } catch {
      setMessage("No connection. Nothing you typed was lost; try again.");
    } finally {
      (byRider ? setBusy : setComputing)(false);
    }
  }

  computeLatest.current = compute;

  return (
    <div className="grid gap-6 lg:grid-cols-2 lg:items-start">
      <form ref={formRef} onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Today's pressure">
        <DayFields parks={props.parks} park={props.park} trails={props.trails} anyReport={props.anyReport} day={day} errors={errors} onChange={setDay} onParkChange={changePark} loadingPark={loadingPark} />
        <fieldset className="card space-y-3">
          <legend className="px-1 text-lg font-bold">Your bike</legend>
          {props.setups.length > 0 ? (
            <div role="radiogroup" aria-label="Setup" className="space-y-2">
              {[...props.setups, { id: "", name: "Enter a setup by hand", summary: "Not saved" }].map((s) => (
                <label key={s.id || "custom"} className="flex min-h-tap cursor-pointer items-center gap-3 rounded-lg border-2 border-loam-300 bg-white px-3 py-2 has-[:checked]:border-loam-900 has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-moss-600">
                  <input type="radio" name="setup" value={s.id} checked={(setupId ?? "") === s.id} onChange={() => setSetupId(s.id || null)} className="h-6 w-6 accent-loam-900" />
                  <span>
                    <span className="block font-bold">{s.name}</span>
                    <span className="block text-sm text-loam-800">{s.summary}</span>
                  </span>
                </label>
              ))}
            </div>
          ) : (
            <p className="text-loam-800">
              {props.signedIn ? (
                <>Enter your bike below, or <Link className="font-semibold underline" href="/me/setups/new">save a setup</Link> to skip this next time.</>
              ) : (
                <>Enter your bike below. <a className="font-semibold underline" href="/sign-in?callbackUrl=/pressure">Sign in</a> to save setups and baselines.</>
              )}
            </p>
          )}
          {setupId && <Segments name="unit" legend="Show pressures in" value={unit} options={PRESSURE_UNITS.map((u) => ({ value: u, label: u }))} onChange={setUnit} />}
        </fieldset>
        {!setupId && (
          <BikeSteps
            draft={draft}
            errors={errors}
            onChange={setDraft}
            step={step}
            reached={reached}
            onStep={openStep}
            lastStepExtra={!props.signedIn && <CheckInput id="remember" label="Keep this setup on this device (never sent to us to store)" checked={remember} onChange={setRemember} />}
          />
        )}
        <p role="alert" aria-live="assertive" className={message ? "rounded-lg bg-brick-100 p-3 font-semibold text-brick-600" : "sr-only"}>
          {message ?? ""}
        </p>
        {(setupId || step === LAST_BIKE_STEP) && (
          <button type="submit" className="btn-primary w-full text-lg" disabled={busy}>
            {busy ? "Working it out…" : "Show my pressure band"}
          </button>
        )}
      </form>
      {/* After the form in reading and Tab order; shown first on a phone once there is a band, beside the form on a desktop. */}
      <div aria-live="polite" className={`${answer ? "order-first" : ""} lg:order-none lg:sticky lg:top-4`}>
        {answer ? <BandResult ref={resultHeading} answer={answer} /> : computing ? <p className="card font-semibold">Working out today&apos;s band…</p> : <Cautions cautions={STANDARD_CAUTIONS} />}
      </div>
    </div>
  );
}
