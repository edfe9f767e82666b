import "server-only";
/**
 * POST /api/pressure behind the handler: resolves a saved setup (own only) and the park's trails
 * for today into the engine's input, then runs the pure engine. A trail without a report today
 * is unknown (the engine says so in a caution); a closed trail adds a caution of its own.
 */
import type { Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { findOwnSetup, storedSetup } from "@/lib/setups/setup-queries";
import { defaultTrailIds, parkForRequest, pickTrails, trailConditions, trailsToday, type TrailToday } from "@/lib/pressure/trails-today";
import { computePressureBand, inputFromRequest, type PressureResult } from "@/lib/pressure/pure";
import { formatTemperature, type PressureUnit } from "@/lib/shared/units";
import { parseInput } from "@/lib/shared/parse";
import {
  pressureRequestSchema,
  savedSetupPressureRequestSchema,
  type PressureRequest,
  type TrailConditions,
} from "@/lib/pressure/pure/schemas";
import { unitsOf } from "@/lib/accounts/pure/units-schema";
import { rideEvidence } from "@/lib/setups/ride-log-queries";
import type { RideEvidence } from "@/lib/pressure/pure/schemas";
import { User } from "@/models";
import { pumpTemperatureLabel } from "@/lib/pressure/pure/pump";
import { rideTemperatures, type RideTemperatures } from "@/lib/weather/park-weather";
import { DEFAULT_RIDE_HOURS } from "@/lib/weather/pure/rules";
import { forecastReason, parkClockText, rideHoursText } from "@/lib/weather/pure/summary";
import { WEATHER_ATTRIBUTION } from "@/lib/weather/pure/types";

export type PressureConditions = {
  park: { slug: string; name: string; baseElevationM: number; summitElevationM: number };
  reportDate: string;
  rideElevationM: number;
  /** The planned trails' height range: the maximum is checked at the top, the band widens with the span. */
  lowestElevationM: number;
  highestElevationM: number;
  trails: Pick<TrailToday, "id" | "name" | "status" | "surfaces" | "features">[];
  /** Set when no temperature was typed and the park's stored weather supplied both. */
  weather?: RideTemperatures & { text: string; attribution: string };
};
export type PressureAnswer = PressureResult & { unit: PressureUnit; setupId?: string; conditions?: PressureConditions };

const hasSetupId = (raw: unknown) => typeof raw === "object" && raw !== null && "setupId" in raw;

/** The request with its setup filled in: inline, or from one of the caller's saved setups. */
async function setupRequest(actor: Actor | null, raw: unknown): Promise<{ request: PressureRequest; setupId?: string; rides?: RideEvidence[] }> {
  if (!hasSetupId(raw)) return { request: parseInput(pressureRequestSchema, raw) };
  const body = parseInput(savedSetupPressureRequestSchema, raw);
  const setup = await findOwnSetup(actor, body.setupId);
  const user = await User.findByPk(setup.userId, { attributes: ["units"] });
  const { name: _name, suspension: _suspension, baseline, ...stored } = storedSetup(setup);
  const request = parseInput(pressureRequestSchema, {
    ...stored,
    ...(baseline ? { baseline } : {}),
    unit: body.unit ?? unitsOf(user?.units).pressure,
    ...(body.today ? { today: body.today } : {}),
  });
  return { request, setupId: setup.id, rides: await rideEvidence(setup.id) };
}

const closedCaution = (closed: TrailToday[]) =>
  `Closed today: ${closed.map((t) => t.name).join(", ")}. Do not ride closed trails; follow park signage and staff.`;

export async function pressureForRequest(actor: Actor | null, raw: unknown, now = new Date()): Promise<PressureAnswer> {
  const { request, setupId, rides } = await setupRequest(actor, raw);
  const today = request.today;
  let trails: TrailConditions[] = [];
  let conditions: PressureConditions | undefined;
  let closed: TrailToday[] = [];
  if (today?.trailIds?.length && !today.parkSlug) throw new AppError(422, "Name the park these trails belong to.", "today.parkSlug");
  if (today?.parkSlug) {
    const park = await parkForRequest(today.parkSlug, "today.parkSlug");
    const parkDay = await trailsToday(park, now);
    const chosen = pickTrails(parkDay, today.trailIds?.length ? today.trailIds : defaultTrailIds(parkDay), "today.trailIds");
    trails = chosen.map((t) => trailConditions(t, now));
    closed = chosen.filter((t) => t.status === "closed");
    // The planned trails' heights (the park's base and summit where a trail has none): the maximum is
    // checked at the top, the band widens with the span, and the midpoint stands for the day.
    today.highestElevationM ??= Math.max(...chosen.map((t) => t.maxElevationM ?? park.summitElevationM));
    today.lowestElevationM ??= Math.min(...chosen.map((t) => t.minElevationM ?? park.baseElevationM));
    today.rideElevationM ??= Math.round((today.lowestElevationM + today.highestElevationM) / 2);
    // No temperatures typed: the forecast for the ride hours on the trail, now's at the pump (stored by the worker).
    const temperatures = today.airTemperatureC === undefined && today.pumpTemperatureC === undefined ? await rideTemperatures(park, today.rideHours ?? DEFAULT_RIDE_HOURS, now) : null;
    if (temperatures) {
      today.airTemperatureC = temperatures.trailC;
      today.pumpTemperatureC = temperatures.pumpC;
    }
    conditions = {
      park: { slug: park.slug, name: park.name, baseElevationM: park.baseElevationM, summitElevationM: park.summitElevationM },
      reportDate: parkDay.reportDate,
      rideElevationM: today.rideElevationM,
      lowestElevationM: today.lowestElevationM,
      highestElevationM: today.highestElevationM,
      trails: chosen.map(({ id, name, status, surfaces, features }) => ({ id, name, status, surfaces, features })),
      ...(temperatures
        ? { weather: { ...temperatures, text: forecastReason(temperatures, `measured ${parkClockText(temperatures.measuredAt, now, park.timeZone)}${temperatures.stale ? ", not updated since" : ""}`), attribution: WEATHER_ATTRIBUTION.text } }
        : {}),
    };
  }
  const band = computePressureBand({ ...inputFromRequest(request, trails), ...(rides?.length ? { rides } : {}) });
  const result = conditions?.weather ? { ...band, reasons: band.reasons.map((r) => withWeatherSource(r, conditions.weather!)) } : band;
  const cautions = closed.length > 0 ? [closedCaution(closed), ...result.cautions] : result.cautions;
  return { ...result, cautions, unit: request.unit, ...(setupId ? { setupId } : {}), ...(conditions ? { conditions } : {}) };
}

/** The pump-temperature reason names where its temperatures came from: "8 °C forecast for 10:00–14:00, 3 °C now (park weather): +0.4 psi … to pump now". */
function withWeatherSource(reason: PressureResult["reasons"][number], weather: RideTemperatures): PressureResult["reasons"][number] {
  const label = pumpTemperatureLabel(weather.trailC - weather.pumpC);
  if (reason.id !== "pump-temperature" || !reason.text.startsWith(label)) return reason;
  return { ...reason, text: `${label} (the park's weather: ${formatTemperature(weather.trailC)} forecast for ${rideHoursText(weather.hours)}, ${formatTemperature(weather.pumpC)} now)${reason.text.slice(label.length)}` };
}
