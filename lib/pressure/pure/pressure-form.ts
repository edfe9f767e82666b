/**
 * The "Today's pressure" form → the body of POST /api/pressure. Pure and client-safe: the same
 * schemas the handler uses check it first, and errors are keyed by the form's own fields.
 */
import type { PressureUnit } from "@/lib/shared/units";
import { DEFAULT_RIDE_HOURS } from "@/lib/weather/pure/rules";
import { pressureRequestSchema, savedSetupPressureRequestSchema, todayRequestSchema, type Surface } from "./schemas";
import { draftErrors, draftFieldFor, numberFrom, parseSetupDraft, type DraftErrors, type SetupDraft } from "@/lib/setups/pure/setup-form";

export type DayDraft = {
  parkSlug: string | null;
  trailIds: string[];
  surfaces: Surface[];
  airTemperature: string;
  pumpTemperature: string;
  rideElevation: string;
  pumpElevation: string;
  /** Park-local hours of riding, whose forecast stands for the trail's air when no temperature is typed. */
  rideFrom: string;
  rideTo: string;
};
export const emptyDayDraft = (parkSlug: string | null, trailIds: string[]): DayDraft => ({
  parkSlug, trailIds, surfaces: [], airTemperature: "", pumpTemperature: "", rideElevation: "", pumpElevation: "",
  rideFrom: String(DEFAULT_RIDE_HOURS.from), rideTo: String(DEFAULT_RIDE_HOURS.to),
});

/** API paths of the day's fields → the form's field names. */
const DAY_FIELD: Record<string, string> = {
  "today.parkSlug": "park",
  "today.trailIds": "trails",
  "today.surfaces": "surfaces",
  "today.airTemperatureC": "airTemperature",
  "today.pumpTemperatureC": "pumpTemperature",
  "today.rideElevationM": "rideElevation",
  "today.pumpElevationM": "pumpElevation",
  "today.rideHours.from": "rideFrom",
  "today.rideHours.to": "rideTo",
};

export const pressureFieldFor = (path: string) => DAY_FIELD[path] ?? draftFieldFor(path);

/** The ride hours, sent only when the rider moved them off the default (the server assumes it). */
function rideHours(day: DayDraft) {
  const hours = { from: Number(day.rideFrom), to: Number(day.rideTo) };
  const isDefault = hours.from === DEFAULT_RIDE_HOURS.from && hours.to === DEFAULT_RIDE_HOURS.to;
  return day.parkSlug && !isDefault ? { rideHours: hours } : {};
}

function today(day: DayDraft) {
  return {
    ...(day.parkSlug ? { parkSlug: day.parkSlug, trailIds: day.trailIds } : {}),
    ...rideHours(day),
    ...(day.surfaces.length ? { surfaces: day.surfaces } : {}),
    airTemperatureC: numberFrom(day.airTemperature),
    pumpTemperatureC: numberFrom(day.pumpTemperature),
    rideElevationM: numberFrom(day.rideElevation),
    pumpElevationM: numberFrom(day.pumpElevation),
  };
}

const dropUndefined = (o: Record<string, unknown>) => Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined));

export type PressureFormResult = { ok: true; body: Record<string, unknown> } | { ok: false; errors: DraftErrors };

/** Builds and checks the request: a saved setup by id, or the unsaved setup typed on the page. */
export function pressureRequestFrom(choice: { setupId: string | null; draft: SetupDraft; day: DayDraft; unit: PressureUnit }): PressureFormResult {
  const errors: DraftErrors = {};
  const day = dropUndefined(today(choice.day));
  const dayParsed = todayRequestSchema.safeParse(day);
  if (!dayParsed.success) for (const i of dayParsed.error.issues) errors[pressureFieldFor(["today", ...i.path].join("."))] ??= i.message;
  if (choice.day.parkSlug && choice.day.trailIds.length === 0) errors.trails = "Choose at least one trail.";
  let body: Record<string, unknown>;
  if (choice.setupId) {
    body = { setupId: choice.setupId, unit: choice.unit, today: day };
    const parsed = savedSetupPressureRequestSchema.safeParse(body);
    if (!parsed.success) for (const i of parsed.error.issues) errors[pressureFieldFor(i.path.join("."))] ??= i.message;
  } else {
    const setup = parseSetupDraft({ ...choice.draft, name: choice.draft.name.trim() || "Unsaved setup" });
    if (!setup.ok) return { ok: false, errors: { ...setup.errors, ...errors } };
    const { name: _name, suspension: _suspension, baseline, ...rest } = setup.value;
    body = { ...rest, ...(baseline ? { baseline } : {}), unit: choice.unit, today: day };
    const parsed = pressureRequestSchema.safeParse(body);
    if (!parsed.success) Object.assign(errors, draftErrors(parsed.error.issues, choice.draft), errors);
  }
  return Object.keys(errors).length ? { ok: false, errors } : { ok: true, body };
}
