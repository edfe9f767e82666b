"use client";
/** Where and in what conditions: the park, today's trails, and optional temperatures and elevations. */
import type { DayDraft } from "@/lib/pressure/pure/pressure-form";
import { hourText } from "@/lib/weather/pure/summary";
import type { DraftErrors } from "@/lib/setups/pure/setup-form";
import { CheckInput, MultiCheck, SelectInput, TextInput } from "./inputs";
import { surfaceOptions } from "./setup-fields";

export type ParkOption = { slug: string; name: string; baseElevationM: number; summitElevationM: number };
export type TrailOption = { id: string; name: string; difficulty: string; status: "open" | "caution" | "closed" | null; surfaces: string[]; features: string[] };

const STATUS_TEXT = { open: "Open", caution: "Caution", closed: "Closed" } as const;
const HOURS = Array.from({ length: 24 }, (_, h) => ({ value: String(h), label: hourText(h) }));

function TrailPicker({ trails, anyReport, day, errors, onChange }: { trails: TrailOption[]; anyReport: boolean; day: DayDraft; errors: DraftErrors; onChange: (day: DayDraft) => void }) {
  const toggle = (id: string, on: boolean) => onChange({ ...day, trailIds: on ? [...day.trailIds, id] : day.trailIds.filter((t) => t !== id) });
  const ridable = trails.filter((t) => (anyReport ? t.status === "open" || t.status === "caution" : true)).map((t) => t.id);
  return (
    <fieldset aria-describedby="trails-error" className="space-y-2">
      <legend className="label">Trails you plan to ride</legend>
      {!anyReport && (
        <p className="rounded-lg bg-loam-100 p-2 text-sm font-semibold text-loam-900" data-testid="no-reports-note">
          No trail reports yet today: every trail is picked, and the ground on each counts as unknown.
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn-quiet" onClick={() => onChange({ ...day, trailIds: ridable })}>
          {anyReport ? "All open trails" : "All trails"}
        </button>
        <button type="button" className="btn-quiet" onClick={() => onChange({ ...day, trailIds: [] })}>
          None
        </button>
      </div>
      <div className="grid gap-2 sm:grid-cols-2">
        {trails.map((t) => (
          <CheckInput key={t.id} id={`trail-${t.id}`} label={t.name} checked={day.trailIds.includes(t.id)} onChange={(on) => toggle(t.id, on)}>
            <span className={`ml-auto rounded px-2 py-0.5 text-xs font-bold uppercase ${t.status === "closed" ? "bg-brick-600 text-white" : "bg-loam-100 text-loam-900"}`}>
              {t.status ? STATUS_TEXT[t.status] : "No report"}
              {t.surfaces.length > 0 && ` · ${t.surfaces.join(", ")}`}
            </span>
          </CheckInput>
        ))}
      </div>
      {trails.length === 0 && <p className="text-loam-800">This park has no trails mapped yet.</p>}
      <p id="trails-error" className="field-error" aria-live="polite">
        {errors.trails ?? ""}
      </p>
    </fieldset>
  );
}

export function DayFields(props: {
  parks: ParkOption[];
  park: ParkOption | null;
  trails: TrailOption[];
  anyReport: boolean;
  day: DayDraft;
  errors: DraftErrors;
  onChange: (day: DayDraft) => void;
  onParkChange: (slug: string) => void;
  loadingPark: boolean;
}) {
  const { day, errors, onChange, park } = props;
  const midpoint = park ? Math.round((park.baseElevationM + park.summitElevationM) / 2) : null;
  return (
    <fieldset className="card space-y-4">
      <legend className="px-1 text-lg font-bold">Where you ride today</legend>
      <SelectInput
        id="park"
        label="Park"
        value={day.parkSlug ?? ""}
        options={[...props.parks.map((p) => ({ value: p.slug, label: p.name })), { value: "", label: "Not at a park (enter the ground below)" }]}
        onChange={props.onParkChange}
        error={errors.park}
      />
      {props.loadingPark ? <p aria-live="polite">Loading the park&apos;s trails…</p> : park && <TrailPicker {...props} />}
      <details className="rounded-lg border border-loam-300 bg-white p-3">
        <summary className="min-h-tap cursor-pointer py-2 font-bold">More about today (optional)</summary>
        <div className="mt-2 space-y-3">
          <MultiCheck name="surfaces" legend={park ? "Ground to add to every trail (e.g. it rained since the report)" : "Ground today"} values={day.surfaces} options={surfaceOptions} onChange={(surfaces) => onChange({ ...day, surfaces })} error={errors.surfaces} />
          <div className="grid grid-cols-2 gap-3">
            <TextInput id="air-temperature" label="Air on the trail (°C)" value={day.airTemperature} onChange={(airTemperature) => onChange({ ...day, airTemperature })} error={errors.airTemperature} inputMode="text" />
            <TextInput id="pump-temperature" label="Where you pump (°C)" value={day.pumpTemperature} onChange={(pumpTemperature) => onChange({ ...day, pumpTemperature })} error={errors.pumpTemperature} inputMode="text" />
            <TextInput id="ride-elevation" label="Ride elevation (m)" value={day.rideElevation} onChange={(rideElevation) => onChange({ ...day, rideElevation })} error={errors.rideElevation} hint={midpoint ? `Blank: ${midpoint} m, halfway up the park.` : undefined} inputMode="numeric" />
            <TextInput id="pump-elevation" label="Pump elevation (m)" value={day.pumpElevation} onChange={(pumpElevation) => onChange({ ...day, pumpElevation })} error={errors.pumpElevation} hint="Blank: same as the ride." inputMode="numeric" />
          </div>
          {park && (
            <fieldset className="space-y-1">
              <legend className="label">Hours you ride (park time)</legend>
              <p className="text-sm text-loam-700">With the temperatures blank, the park&apos;s forecast for these hours stands for the air on the trail.</p>
              <div className="grid grid-cols-2 gap-3">
                <SelectInput id="ride-from" label="From" value={day.rideFrom} options={HOURS} onChange={(rideFrom) => onChange({ ...day, rideFrom })} error={errors.rideFrom} />
                <SelectInput id="ride-to" label="Until" value={day.rideTo} options={HOURS} onChange={(rideTo) => onChange({ ...day, rideTo })} error={errors.rideTo} />
              </div>
            </fieldset>
          )}
        </div>
      </details>
    </fieldset>
  );
}
