"use client";
/** Log a ride: what was run and how each tyre felt → the one suggested change, and a button to apply it. */
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState, useTransition } from "react";
import { canApply, type StoredSuggestion } from "@/lib/setups/pure/suggestion";
import { formatPressure, kpaFrom, type PressureUnit } from "@/lib/shared/units";
import { SYMPTOMS, type Surface, type Symptom } from "@/lib/pressure/pure/schemas";
import { rideLogSchema } from "@/lib/setups/pure/ride-log-schema";
import { numberFrom, pressureText, type DraftErrors } from "@/lib/setups/pure/setup-form";
import type { ParkOption, TrailOption } from "./day-fields";
import { CheckInput, MultiCheck, SelectInput, TextInput } from "./inputs";
import { surfaceOptions } from "./setup-fields";

type SetupChoice = { id: string; name: string; baseline: { frontKpa: number; rearKpa: number } | null };
type Props = { setups: SetupChoice[]; parks: ParkOption[]; park: ParkOption | null; trails: TrailOption[]; today: string; unit: PressureUnit };
type Logged = { id: string; suggestion: StoredSuggestion; setupHasBaseline: boolean };

const SYMPTOM_LABELS: Record<Symptom, string> = {
  "squirm-in-berms": "Squirm or roll in berms", "rim-strike": "Rim strike", burp: "Burp", harsh: "Harsh or bouncing", sliding: "Sliding", fine: "Felt fine",
};
const symptomOptions = SYMPTOMS.map((s) => ({ value: s, label: SYMPTOM_LABELS[s] }));
const FIELD: Record<string, string> = { frontKpa: "front", rearKpa: "rear", "symptoms.front": "symptomsFront", "symptoms.rear": "symptomsRear" };

export function RideLogForm({ setups, parks, park, trails, today, unit }: Props) {
  const router = useRouter();
  const [loadingPark, startParkChange] = useTransition();
  const first = setups[0];
  const [setupId, setSetupId] = useState(first?.id ?? "");
  const [riddenOn, setRiddenOn] = useState(today);
  const [trailIds, setTrailIds] = useState<string[]>([]);
  const [front, setFront] = useState(pressureText(first?.baseline?.frontKpa, unit));
  const [rear, setRear] = useState(pressureText(first?.baseline?.rearKpa, unit));
  const [symptoms, setSymptoms] = useState<{ front: Symptom[]; rear: Symptom[] }>({ front: [], rear: [] });
  const [surfaces, setSurfaces] = useState<Surface[]>([]);
  const [note, setNote] = useState("");
  const [errors, setErrors] = useState<DraftErrors>({});
  const [message, setMessage] = useState<string | null>(null);
  const [logged, setLogged] = useState<Logged | null>(null);
  const [applied, setApplied] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const suggestionHeading = useRef<HTMLHeadingElement>(null);
  useEffect(() => {
    if (logged) suggestionHeading.current?.focus();
  }, [logged]);

  const chooseSetup = (id: string) => {
    setSetupId(id);
    const s = setups.find((x) => x.id === id);
    if (s?.baseline) [setFront, setRear].forEach((set, i) => set(pressureText(i ? s.baseline!.rearKpa : s.baseline!.frontKpa, unit)));
  };
  const changePark = (slug: string) => {
    setTrailIds([]);
    startParkChange(() => router.replace(`/me/rides/new?park=${encodeURIComponent(slug || "none")}`, { scroll: false }));
  };

  async function post(url: string, body?: unknown) {
    setBusy(true);
    try {
      const response = await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body ?? {}) });
      return { response, data: await response.json() };
    } finally {
      setBusy(false);
    }
  }

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const kpa = (text: string) => { const v = numberFrom(text); return v === undefined || Number.isNaN(v) ? v : kpaFrom(v, unit); };
    const body = { setupId, riddenOn, ...(park ? { parkSlug: park.slug, trailIds } : {}), frontKpa: kpa(front), rearKpa: kpa(rear), symptoms, surfaces, ...(note.trim() ? { note } : {}) };
    const parsed = rideLogSchema.safeParse(body);
    if (!parsed.success) {
      const next: DraftErrors = {};
      for (const i of parsed.error.issues) { const path = i.path.join("."); next[FIELD[path] ?? path] ??= i.message.replace(/(\d+) kPa/g, (_, n) => formatPressure(Number(n), unit)); }
      setErrors(next);
      setMessage("Check the highlighted fields.");
      return;
    }
    setErrors({});
    setMessage(null);
    try {
      const { response, data } = await post("/api/me/ride-logs", parsed.data);
      if (!response.ok) {
        if (data?.error?.field) setErrors({ [FIELD[data.error.field] ?? data.error.field]: data.error.message });
        setMessage(data?.error?.message ?? "Not saved. Try again.");
        return;
      }
      setLogged({ id: data.rideLog.id, suggestion: data.suggestion, setupHasBaseline: Boolean(setups.find((s) => s.id === setupId)?.baseline) });
    } catch {
      setMessage("No connection: not saved. What you typed is still here.");
    }
  }

  async function apply() {
    if (!logged) return;
    const { response, data } = await post(`/api/me/ride-logs/${logged.id}/apply`);
    if (!response.ok) return setMessage(data?.error?.message ?? "Not applied.");
    const b = data.setup.baseline;
    setApplied(`Baseline of ${data.setup.name} is now ${formatPressure(b.frontKpa, unit)} front, ${formatPressure(b.rearKpa, unit)} rear.`);
  }

  if (logged) {
    const s = logged.suggestion;
    const both = s.wheel === "both" && s.deltas;
    const change = s.deltaKpa === 0 && !both
      ? "No change"
      : both
        ? `${formatPressure(s.deltas!.frontKpa, unit, { signed: true })} front, ${formatPressure(s.deltas!.rearKpa, unit, { signed: true })} rear`
        : `${formatPressure(s.deltaKpa, unit, { signed: true })} ${s.wheel}`;
    return (
      <section className="space-y-4" aria-labelledby="suggestion-heading" data-testid="suggestion">
        <h2 id="suggestion-heading" ref={suggestionHeading} tabIndex={-1} className="text-2xl font-extrabold focus:outline-3 focus:outline-moss-600">One change for next time</h2>
        <div className="rounded-xl border-2 border-loam-900 bg-white p-4">
          <p className="text-4xl font-black" data-testid="suggestion-change">{change}</p>
          <p className="mt-2 text-lg text-loam-900">{s.reason}</p>
        </div>
        {applied ? (
          <p role="status" className="rounded-lg bg-moss-100 p-3 font-semibold text-moss-700">{applied}</p>
        ) : canApply({ suggestion: s, appliedAt: null, setupId }, logged.setupHasBaseline) ? (
          <button type="button" className="btn-primary w-full text-lg" onClick={apply} disabled={busy}>
            {logged.setupHasBaseline ? "Apply to my baseline" : "Save what I ran as my baseline, with this change"}
          </button>
        ) : null}
        <p role="alert" className="field-error">{message ?? ""}</p>
        <div className="flex flex-wrap gap-2">
          <Link href="/me/rides" className="btn-quiet">Ride history</Link>
          <Link href="/pressure" className="btn-quiet">Today&apos;s pressure</Link>
        </div>
      </section>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Log a ride">
      <fieldset className="card space-y-3">
        <legend className="px-1 text-lg font-bold">The ride</legend>
        <SelectInput id="ride-setup" label="Setup" value={setupId} options={setups.map((s) => ({ value: s.id, label: s.name }))} onChange={chooseSetup} error={errors.setupId} />
        <TextInput id="ride-date" label="Date" type="date" inputMode="text" value={riddenOn} onChange={setRiddenOn} error={errors.riddenOn} />
        <SelectInput id="ride-park" label="Park" value={park?.slug ?? ""} options={[...parks.map((p) => ({ value: p.slug, label: p.name })), { value: "", label: "Not at a park" }]} onChange={changePark} error={errors.parkSlug} />
        {loadingPark ? <p aria-live="polite">Loading the park&apos;s trails…</p> : park && (
          <fieldset className="space-y-2">
            <legend className="label">Trails ridden (optional)</legend>
            <div className="grid gap-2 sm:grid-cols-2">
              {trails.map((t) => <CheckInput key={t.id} id={`ride-trail-${t.id}`} label={t.name} checked={trailIds.includes(t.id)} onChange={(on) => setTrailIds(on ? [...trailIds, t.id] : trailIds.filter((x) => x !== t.id))} />)}
            </div>
            <p className="field-error" aria-live="polite">{errors.trailIds ?? ""}</p>
          </fieldset>
        )}
        <MultiCheck name="ride-surfaces" legend="Ground it was on (optional)" values={surfaces} options={surfaceOptions} onChange={setSurfaces} error={errors.surfaces} />
      </fieldset>
      <fieldset className="card space-y-3">
        <legend className="px-1 text-lg font-bold">What you ran and how it felt</legend>
        <div className="grid grid-cols-2 gap-3">
          <TextInput id="ride-front" label={`Front (${unit})`} value={front} onChange={setFront} error={errors.front} />
          <TextInput id="ride-rear" label={`Rear (${unit})`} value={rear} onChange={setRear} error={errors.rear} />
        </div>
        <MultiCheck name="front-symptoms" legend="Front tyre" values={symptoms.front} options={symptomOptions} onChange={(v) => setSymptoms({ ...symptoms, front: v })} error={errors.symptomsFront} />
        <MultiCheck name="rear-symptoms" legend="Rear tyre" values={symptoms.rear} options={symptomOptions} onChange={(v) => setSymptoms({ ...symptoms, rear: v })} error={errors.symptomsRear} />
        <div>
          <label htmlFor="ride-note" className="label">Note (optional)</label>
          <textarea id="ride-note" value={note} onChange={(e) => setNote(e.target.value)} rows={3} maxLength={1000} className="field py-2" />
        </div>
      </fieldset>
      <p role="alert" aria-live="assertive" className={message ? "rounded-lg bg-brick-100 p-3 font-semibold text-brick-600" : "sr-only"}>{message ?? ""}</p>
      <button type="submit" className="btn-primary w-full text-lg" disabled={busy || setups.length === 0}>{busy ? "Saving…" : "Log ride and get one suggestion"}</button>
    </form>
  );
}
