/**
 * The setup form as typed: text in the rider's units (kg or lb; psi, bar or kPa; tyre width in
 * inches or mm). parseSetupDraft converts to SI and validates with the same zod schema the route
 * handlers use, then names each problem by the form field it came from, in the rider's units.
 * Pure and client-safe: the form runs it on every change, the handlers re-check on the server.
 */
import { formatPressure, inToMm, kgToLb, kpaFrom, kpaTo, lbToKg, mmToIn, type MassUnit, type PressureUnit } from "@/lib/shared/units";
import { z } from "zod";
import { MASS_UNITS, PRESSURE_UNITS } from "@/lib/shared/units";
import { CASINGS, PACES, surfaceSchema, type Casing, type Pace, type Surface } from "@/lib/pressure/pure/schemas";
import { setupSchema, type SetupInput } from "./setup-schema";

export type WidthUnit = "in" | "mm";
export type WheelDraft = { bsd: string; width: string; widthUnit: WidthUnit; casing: Casing; insert: boolean; tubeless: boolean; max: string; rimMax: string };
export type SetupDraft = {
  name: string;
  massUnit: MassUnit;
  pressureUnit: PressureUnit;
  riderMass: string;
  bikeMass: string;
  pace: Pace;
  front: WheelDraft;
  rear: WheelDraft;
  baselineFront: string;
  baselineRear: string;
  baselineSurfaces: Surface[];
  baselineTemperature: string;
  /** Where the baseline was checked, and (optionally) the air and height it was ridden in. */
  baselineElevation: string;
  baselineRideTemperature: string;
  baselineRideElevation: string;
  rearStroke: string;
  rearSag: string;
  forkTravel: string;
  frontSag: string;
};
export type DraftErrors = Record<string, string>;
export type DraftResult = { ok: true; value: SetupInput } | { ok: false; errors: DraftErrors };

const emptyWheel = (): WheelDraft => ({ bsd: "622", width: "2.4", widthUnit: "in", casing: "trail", insert: false, tubeless: true, max: "", rimMax: "" });

export const emptySetupDraft = (units: { pressure: PressureUnit; mass: MassUnit }): SetupDraft => ({
  name: "",
  massUnit: units.mass,
  pressureUnit: units.pressure,
  riderMass: "",
  bikeMass: "",
  pace: "steady",
  front: emptyWheel(),
  rear: emptyWheel(),
  baselineFront: "",
  baselineRear: "",
  baselineSurfaces: ["dry"],
  baselineTemperature: "",
  baselineElevation: "",
  baselineRideTemperature: "",
  baselineRideElevation: "",
  rearStroke: "",
  rearSag: "",
  forkTravel: "",
  frontSag: "",
});

const text = z.string().max(60);
const wheelDraftSchema = z.object({ bsd: text, width: text, widthUnit: z.enum(["in", "mm"]), casing: z.enum(CASINGS), insert: z.boolean(), tubeless: z.boolean(), max: text, rimMax: text });
/** The shape of a draft kept in the browser; anything else found there is ignored. */
export const setupDraftSchema = z.object({
  name: text, massUnit: z.enum(MASS_UNITS), pressureUnit: z.enum(PRESSURE_UNITS), riderMass: text, bikeMass: text, pace: z.enum(PACES),
  front: wheelDraftSchema, rear: wheelDraftSchema, baselineFront: text, baselineRear: text, baselineSurfaces: z.array(surfaceSchema).max(10),
  baselineTemperature: text, baselineElevation: text.default(""), baselineRideTemperature: text.default(""), baselineRideElevation: text.default(""),
  rearStroke: text, rearSag: text, forkTravel: text, frontSag: text,
});

/** Blank → undefined; "19,5" → 19.5; anything else that is not a number → NaN (refused by zod). */
export function numberFrom(text: string): number | undefined {
  const trimmed = text.trim();
  if (trimmed === "") return undefined;
  return /^[-+]?(\d+([.,]\d*)?|[.,]\d+)$/.test(trimmed) ? Number(trimmed.replace(",", ".")) : Number.NaN;
}

const map = <T, R>(value: T | undefined, fn: (v: T) => R) => (value === undefined || Number.isNaN(value) ? value : fn(value)) as R | undefined;
const round = (value: number, decimals: number) => Number(value.toFixed(decimals));

function wheelFrom(wheel: WheelDraft, unit: PressureUnit) {
  const width = numberFrom(wheel.width);
  return {
    bsdMm: Number(wheel.bsd),
    widthMm: map(width, (w) => (wheel.widthUnit === "in" ? round(inToMm(w), 1) : w)),
    casing: wheel.casing,
    insert: wheel.insert,
    tubeless: wheel.tubeless,
    maxKpa: map(numberFrom(wheel.max), (v) => kpaFrom(v, unit)),
    rimMaxKpa: map(numberFrom(wheel.rimMax), (v) => kpaFrom(v, unit)),
  };
}

/** The draft in SI, before validation. Blank optional parts (baseline, suspension) are left out. */
export function setupFromDraft(draft: SetupDraft): Record<string, unknown> {
  const p = draft.pressureUnit;
  const mass = (text: string) => map(numberFrom(text), (v) => (draft.massUnit === "lb" ? lbToKg(v) : v));
  const hasBaseline = draft.baselineFront.trim() !== "" || draft.baselineRear.trim() !== "";
  const suspension = {
    rearStrokeMm: numberFrom(draft.rearStroke),
    rearSagMm: numberFrom(draft.rearSag),
    forkTravelMm: numberFrom(draft.forkTravel),
    frontSagMm: numberFrom(draft.frontSag),
  };
  const hasSuspension = Object.values(suspension).some((v) => v !== undefined);
  return {
    name: draft.name,
    riderMassKg: mass(draft.riderMass),
    bikeMassKg: mass(draft.bikeMass),
    pace: draft.pace,
    front: wheelFrom(draft.front, p),
    rear: wheelFrom(draft.rear, p),
    baseline: hasBaseline
      ? {
          frontKpa: map(numberFrom(draft.baselineFront), (v) => kpaFrom(v, p)),
          rearKpa: map(numberFrom(draft.baselineRear), (v) => kpaFrom(v, p)),
          surfaces: draft.baselineSurfaces,
          temperatureC: numberFrom(draft.baselineTemperature),
          elevationM: numberFrom(draft.baselineElevation),
          rideTemperatureC: numberFrom(draft.baselineRideTemperature),
          rideElevationM: numberFrom(draft.baselineRideElevation),
        }
      : null,
    suspension: hasSuspension ? suspension : null,
  };
}

/** Which form field each SI path comes from. */
const FIELD_OF: Record<string, string> = {
  riderMassKg: "riderMass",
  bikeMassKg: "bikeMass",
  "baseline.frontKpa": "baselineFront",
  "baseline.rearKpa": "baselineRear",
  "baseline.surfaces": "baselineSurfaces",
  "baseline.temperatureC": "baselineTemperature",
  "baseline.elevationM": "baselineElevation",
  "baseline.rideTemperatureC": "baselineRideTemperature",
  "baseline.rideElevationM": "baselineRideElevation",
  "suspension.rearStrokeMm": "rearStroke",
  "suspension.rearSagMm": "rearSag",
  "suspension.forkTravelMm": "forkTravel",
  "suspension.frontSagMm": "frontSag",
};
const WHEEL_FIELD: Record<string, string> = { bsdMm: "bsd", widthMm: "width", maxKpa: "max", rimMaxKpa: "rimMax" };

/** "front.widthMm" → "front.width", "riderMassKg" → "riderMass"; unknown paths stay as they are. */
export function draftFieldFor(path: string): string {
  if (FIELD_OF[path]) return FIELD_OF[path];
  const [wheel, key] = path.split(".");
  if ((wheel === "front" || wheel === "rear") && key) return `${wheel}.${WHEEL_FIELD[key] ?? key}`;
  return path || "form";
}

/** Restates the limits of a message in the units the rider typed in ("100 kPa" → "14.5 psi"). */
export function localiseMessage(message: string, field: string, draft: Pick<SetupDraft, "pressureUnit" | "massUnit"> & { widthUnit?: WidthUnit }): string {
  let text = message;
  if (draft.pressureUnit !== "kPa") text = text.replace(/(\d+(?:\.\d+)?) kPa/g, (_, n) => formatPressure(Number(n), draft.pressureUnit));
  if (draft.massUnit === "lb") text = text.replace(/(\d+(?:\.\d+)?) kg/g, (_, n) => `${round(kgToLb(Number(n)), 0)} lb`);
  if (draft.widthUnit === "in" && field.endsWith(".width")) text = text.replace(/(\d+(?:\.\d+)?) mm/g, (_, n) => `${round(mmToIn(Number(n)), 2)} in`);
  return text;
}

/** Converts and validates a draft; errors are keyed by form field and worded in the rider's units. */
export function parseSetupDraft(draft: SetupDraft): DraftResult {
  const parsed = setupSchema.safeParse(setupFromDraft(draft));
  if (parsed.success) return { ok: true, value: parsed.data };
  return { ok: false, errors: draftErrors(parsed.error.issues, draft) };
}

/** Maps zod issues (or a server's `{field, message}`) onto the form's fields, first message per field. */
export function draftErrors(issues: ReadonlyArray<{ path: ReadonlyArray<PropertyKey>; message: string }>, draft: SetupDraft): DraftErrors {
  const errors: DraftErrors = {};
  for (const issue of issues) {
    const field = draftFieldFor(issue.path.map(String).join("."));
    const wheel = field.startsWith("rear.") ? draft.rear : draft.front;
    errors[field] ??= localiseMessage(issue.message, field, { ...draft, widthUnit: wheel.widthUnit });
  }
  return errors;
}

/** Trims a number to at most `decimals` places without trailing zeros: 40.00 → "40", 1.380 → "1.38". */
export const numberText = (value: number, decimals: number) => String(round(value, decimals));

const PRESSURE_DECIMALS: Record<PressureUnit, number> = { psi: 2, bar: 3, kPa: 1 };
export const pressureText = (kPa: number | undefined, unit: PressureUnit) => (kPa === undefined ? "" : numberText(kpaTo(kPa, unit), PRESSURE_DECIMALS[unit]));
export const massText = (kg: number, unit: MassUnit) => numberText(unit === "lb" ? kgToLb(kg) : kg, 1);

/** A stored width shows in inches when it is within 0.1 mm of a whole number of 0.05″ (as typed in inches), else in mm. */
function widthDraft(widthMm: number): Pick<WheelDraft, "width" | "widthUnit"> {
  const inches = mmToIn(widthMm);
  const inInches = Math.abs(inches * 20 - Math.round(inches * 20)) < 0.08;
  return inInches ? { width: numberText(inches, 2), widthUnit: "in" } : { width: numberText(widthMm, 1), widthUnit: "mm" };
}

/** A saved setup as the form shows it, in the rider's units. */
export function draftFromSetup(setup: SetupInput, units: { pressure: PressureUnit; mass: MassUnit }): SetupDraft {
  const p = units.pressure;
  const wheel = (w: SetupInput["front"]): WheelDraft => ({
    bsd: String(w.bsdMm),
    ...widthDraft(w.widthMm),
    casing: w.casing,
    insert: w.insert,
    tubeless: w.tubeless,
    max: pressureText(w.maxKpa, p),
    rimMax: pressureText(w.rimMaxKpa, p),
  });
  const s = setup.suspension ?? {};
  const mm = (v: number | undefined) => (v === undefined ? "" : numberText(v, 1));
  return {
    name: setup.name,
    massUnit: units.mass,
    pressureUnit: p,
    riderMass: massText(setup.riderMassKg, units.mass),
    bikeMass: massText(setup.bikeMassKg, units.mass),
    pace: setup.pace,
    front: wheel(setup.front),
    rear: wheel(setup.rear),
    baselineFront: pressureText(setup.baseline?.frontKpa, p),
    baselineRear: pressureText(setup.baseline?.rearKpa, p),
    baselineSurfaces: setup.baseline?.surfaces ?? ["dry"],
    baselineTemperature: setup.baseline?.temperatureC === undefined ? "" : numberText(setup.baseline.temperatureC, 1),
    baselineElevation: setup.baseline?.elevationM === undefined ? "" : numberText(setup.baseline.elevationM, 0),
    baselineRideTemperature: setup.baseline?.rideTemperatureC === undefined ? "" : numberText(setup.baseline.rideTemperatureC, 1),
    baselineRideElevation: setup.baseline?.rideElevationM === undefined ? "" : numberText(setup.baseline.rideElevationM, 0),
    rearStroke: mm(s.rearStrokeMm),
    rearSag: mm(s.rearSagMm),
    forkTravel: mm(s.forkTravelMm),
    frontSag: mm(s.frontSagMm),
  };
}

/** Re-expresses every typed number when the rider switches units, so nothing typed is lost. */
export function convertDraftUnits(draft: SetupDraft, units: { pressure: PressureUnit; mass: MassUnit }): SetupDraft {
  const pressure = (text: string) => {
    const v = numberFrom(text);
    return v === undefined || Number.isNaN(v) ? text : pressureText(kpaFrom(v, draft.pressureUnit), units.pressure);
  };
  const mass = (text: string) => {
    const v = numberFrom(text);
    if (v === undefined || Number.isNaN(v)) return text;
    return massText(draft.massUnit === "lb" ? lbToKg(v) : v, units.mass);
  };
  const wheel = (w: WheelDraft): WheelDraft => ({ ...w, max: pressure(w.max), rimMax: pressure(w.rimMax) });
  return {
    ...draft,
    pressureUnit: units.pressure,
    massUnit: units.mass,
    riderMass: mass(draft.riderMass),
    bikeMass: mass(draft.bikeMass),
    front: wheel(draft.front),
    rear: wheel(draft.rear),
    baselineFront: pressure(draft.baselineFront),
    baselineRear: pressure(draft.baselineRear),
  };
}

/** Converts a width between inches and mm when the rider flips the width unit. */
export function convertWidth(wheel: WheelDraft, unit: WidthUnit): WheelDraft {
  const v = numberFrom(wheel.width);
  if (unit === wheel.widthUnit || v === undefined || Number.isNaN(v)) return { ...wheel, widthUnit: unit };
  return { ...wheel, widthUnit: unit, width: unit === "in" ? numberText(mmToIn(v), 2) : numberText(inToMm(v), 1) };
}
