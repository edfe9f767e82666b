"use client";
/** The parts of a setup a rider types: weights, pace, both wheels and the optional baseline, one component each. */
import { MASS_UNITS, PRESSURE_UNITS, wheelSizeText, type MassUnit, type PressureUnit } from "@/lib/shared/units";
import { BEAD_SEAT_DIAMETERS_MM, CASINGS, PACES, SURFACES } from "@/lib/pressure/pure/schemas";
import { convertDraftUnits, convertWidth, type DraftErrors, type SetupDraft, type WheelDraft } from "@/lib/setups/pure/setup-form";
import { CheckInput, MultiCheck, Segments, SelectInput, TextInput } from "./inputs";

export const WHEEL_SIZES = BEAD_SEAT_DIAMETERS_MM.map((bsd) => ({
  value: String(bsd),
  label: `${wheelSizeText(bsd)} (${bsd} mm)`,
}));
const CASING_LABELS = { light: "Light", trail: "Trail", reinforced: "Reinforced", downhill: "Downhill" } as const;
const PACE_LABELS = { easy: "Easy", steady: "Steady", hard: "Hard" } as const;
export const surfaceOptions = SURFACES.map((s) => ({ value: s, label: s[0].toUpperCase() + s.slice(1) }));

type Props = { idPrefix: string; draft: SetupDraft; errors: DraftErrors; onChange: (draft: SetupDraft) => void };

export function WheelFields({ idPrefix, position, draft, errors, onChange }: Props & { position: "front" | "rear" }) {
  const wheel = draft[position];
  const set = (patch: Partial<WheelDraft>) => onChange({ ...draft, [position]: { ...wheel, ...patch } });
  const id = (name: string) => `${idPrefix}-${position}-${name}`;
  const title = position === "front" ? "Front wheel" : "Rear wheel";
  const unit = draft.pressureUnit;
  return (
    <fieldset className="card space-y-3">
      <legend className="px-1 text-lg font-bold">{title}</legend>
      {position === "rear" && (
        <button type="button" className="btn-quiet" onClick={() => onChange({ ...draft, rear: { ...draft.front } })}>
          Same as the front
        </button>
      )}
      <SelectInput id={id("bsd")} label={`${title}: wheel size`} value={wheel.bsd} options={WHEEL_SIZES} onChange={(bsd) => set({ bsd })} error={errors[`${position}.bsd`]} />
      <div className="grid grid-cols-[1fr_auto] items-start gap-2">
        <TextInput id={id("width")} label={`${title}: tyre width (${wheel.widthUnit === "in" ? "inches" : "mm"})`} value={wheel.width} onChange={(width) => set({ width })} error={errors[`${position}.width`]} hint="As printed on the tyre, e.g. 2.4 in or 61 mm." />
        <div className="pt-6">
          <Segments name={id("width-unit")} legend="Width in" small value={wheel.widthUnit} options={[{ value: "in", label: "in" }, { value: "mm", label: "mm" }]} onChange={(u) => onChange({ ...draft, [position]: convertWidth(wheel, u) })} />
        </div>
      </div>
      <SelectInput id={id("casing")} label={`${title}: casing`} value={wheel.casing} options={CASINGS.map((c) => ({ value: c, label: CASING_LABELS[c] }))} onChange={(casing) => set({ casing })} />
      <div className="grid grid-cols-2 gap-2">
        <CheckInput id={id("tubeless")} label="Tubeless" checked={wheel.tubeless} onChange={(tubeless) => set({ tubeless })} />
        <CheckInput id={id("insert")} label="Insert" checked={wheel.insert} onChange={(insert) => set({ insert })} />
      </div>
      <TextInput id={id("max")} label={`${title}: tyre's printed maximum (${unit})`} value={wheel.max} onChange={(max) => set({ max })} error={errors[`${position}.max`]} hint="Printed on the tyre's sidewall. Nothing is ever advised above it." />
      <TextInput id={id("rim-max")} label={`${title}: rim's printed maximum (${unit}, optional)`} value={wheel.rimMax} onChange={(rimMax) => set({ rimMax })} error={errors[`${position}.rimMax`]} hint="Printed on the rim or in its manual; the lower of the two counts." />
    </fieldset>
  );
}

/** Who rides the bike: units, weights and pace (the first step of a bike typed in on "Today's pressure"). */
export function RiderFields({ idPrefix, draft, errors, onChange }: Props) {
  const id = (name: string) => `${idPrefix}-${name}`;
  const switchUnits = (units: { pressure: PressureUnit; mass: MassUnit }) => onChange(convertDraftUnits(draft, units));
  return (
    <fieldset className="card space-y-3">
      <legend className="px-1 text-lg font-bold">Rider and bike</legend>
      <div className="flex flex-wrap gap-4">
        <Segments name={id("mass-unit")} legend="Mass in" value={draft.massUnit} options={MASS_UNITS.map((u) => ({ value: u, label: u }))} onChange={(mass) => switchUnits({ pressure: draft.pressureUnit, mass })} />
        <Segments name={id("pressure-unit")} legend="Pressure in" value={draft.pressureUnit} options={PRESSURE_UNITS.map((u) => ({ value: u, label: u }))} onChange={(pressure) => switchUnits({ pressure, mass: draft.massUnit })} />
      </div>
      <div className="grid grid-cols-2 gap-3">
        <TextInput id={id("rider-mass")} label={`Rider with kit (${draft.massUnit})`} value={draft.riderMass} onChange={(riderMass) => onChange({ ...draft, riderMass })} error={errors.riderMass} />
        <TextInput id={id("bike-mass")} label={`Bike (${draft.massUnit})`} value={draft.bikeMass} onChange={(bikeMass) => onChange({ ...draft, bikeMass })} error={errors.bikeMass} />
      </div>
      <Segments name={id("pace")} legend="How you ride" value={draft.pace} options={PACES.map((p) => ({ value: p, label: PACE_LABELS[p] }))} onChange={(pace) => onChange({ ...draft, pace })} />
    </fieldset>
  );
}

/** Pressures the rider knows work, and where they were checked and ridden. */
export function BaselineFields({ idPrefix, draft, errors, onChange }: Props) {
  const id = (name: string) => `${idPrefix}-${name}`;
  return (
    <fieldset className="card space-y-3">
      <legend className="px-1 text-lg font-bold">Baseline (optional)</legend>
      <p className="text-loam-800">Pressures you know work for you, checked with a gauge. Leave blank for a starting estimate.</p>
      <div className="grid grid-cols-2 gap-3">
        <TextInput id={id("baseline-front")} label={`Front (${draft.pressureUnit})`} value={draft.baselineFront} onChange={(baselineFront) => onChange({ ...draft, baselineFront })} error={errors.baselineFront} />
        <TextInput id={id("baseline-rear")} label={`Rear (${draft.pressureUnit})`} value={draft.baselineRear} onChange={(baselineRear) => onChange({ ...draft, baselineRear })} error={errors.baselineRear} />
      </div>
      <MultiCheck name={id("baseline-surfaces")} legend="Ground it was set on" values={draft.baselineSurfaces} options={surfaceOptions} onChange={(baselineSurfaces) => onChange({ ...draft, baselineSurfaces })} error={errors.baselineSurfaces} />
      <div className="grid grid-cols-2 gap-3">
        <TextInput id={id("baseline-temperature")} label="Air where you checked it (°C, optional)" value={draft.baselineTemperature} onChange={(baselineTemperature) => onChange({ ...draft, baselineTemperature })} error={errors.baselineTemperature} inputMode="text" />
        <TextInput id={id("baseline-elevation")} label="Height where you checked it (m, optional)" value={draft.baselineElevation} onChange={(baselineElevation) => onChange({ ...draft, baselineElevation })} error={errors.baselineElevation} inputMode="numeric" />
        <TextInput id={id("baseline-ride-temperature")} label="Air on the trail that day (°C, optional)" value={draft.baselineRideTemperature} onChange={(baselineRideTemperature) => onChange({ ...draft, baselineRideTemperature })} error={errors.baselineRideTemperature} hint="Blank: same as where you checked it." inputMode="text" />
        <TextInput id={id("baseline-ride-elevation")} label="Height of the trail (m, optional)" value={draft.baselineRideElevation} onChange={(baselineRideElevation) => onChange({ ...draft, baselineRideElevation })} error={errors.baselineRideElevation} hint="Blank: same as where you checked it." inputMode="numeric" />
      </div>
    </fieldset>
  );
}

/** The whole setup on one page (the setup editor); "Today's pressure" asks it in steps (`BikeSteps`). */
export function SetupFields(props: Props) {
  return (
    <div className="space-y-4">
      <RiderFields {...props} />
      <WheelFields {...props} position="front" />
      <WheelFields {...props} position="rear" />
      <BaselineFields {...props} />
    </div>
  );
}
