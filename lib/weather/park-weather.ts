import "server-only";
import { Op } from "sequelize";
import { parkLocalDate, parkLocalInstant, shiftDate } from "@/lib/shared/park-clock";
import { ParkWeather, WeatherHour } from "@/models";
import {
  DEFAULT_RIDE_HOURS,
  ageText,
  dayRange,
  isStale,
  lastRainAt,
  meanForHours,
  overnightLow,
  rainBetween,
  rainByDay,
  type DayRain,
  rainCaution,
  yesterdayEvening,
  type RideHours,
} from "./pure/rules";
import type { WeatherHour as Hour } from "./pure/types";

type ParkRef = { id: string; timeZone: string; rainThresholdMm?: number };

/** What pages show: stored values only (pages never call the weather service). Times are ISO strings. */
export type ParkWeatherView = {
  measuredAt: string;
  fetchedAt: string;
  /** Older than STALE_AFTER_MS: shown with its age. */
  stale: boolean;
  age: string;
  nowC: number;
  today: { minC: number; maxC: number } | null;
  rain24hMm: number;
  rainSinceEveningMm: number;
  since: string;
  lastRainAt: string | null;
  overnight: { minC: number; frost: boolean } | null;
  /** The park's caution level reached (morning check), with its text; never a status change. */
  caution: string | null;
  thresholdMm: number;
};

async function hoursBetween(parkId: string, from: Date, to: Date): Promise<Hour[]> {
  const rows = await WeatherHour.findAll({ where: { parkId, at: { [Op.gt]: from, [Op.lte]: to } }, order: [["at", "ASC"]], raw: true });
  return rows.map((r) => ({ at: new Date(r.at), temperatureC: r.temperatureC, precipitationMm: r.precipitationMm }));
}

/** The park's weather as last stored, or null when none was ever fetched. */
export async function parkWeather(park: ParkRef, now = new Date()): Promise<ParkWeatherView | null> {
  const latest = await ParkWeather.findByPk(park.id);
  if (!latest?.fetchedAt || latest.temperatureNowC === null || !latest.measuredAt) return null;
  const today = parkLocalDate(now, park.timeZone);
  const hours = await hoursBetween(park.id, new Date(now.getTime() - 50 * 3600_000), parkLocalInstant(shiftDate(today, 1), "01:00", park.timeZone));
  const since = yesterdayEvening(now, park.timeZone);
  const rain24hMm = rainBetween(hours, new Date(now.getTime() - 24 * 3600_000), now).mm;
  const last = lastRainAt(hours, now);
  const thresholdMm = park.rainThresholdMm ?? 10;
  return {
    measuredAt: latest.measuredAt.toISOString(),
    fetchedAt: latest.fetchedAt.toISOString(),
    stale: isStale(latest.fetchedAt, now),
    age: ageText(latest.fetchedAt, now),
    nowC: latest.temperatureNowC,
    today: dayRange(hours, today, park.timeZone),
    rain24hMm,
    rainSinceEveningMm: rainBetween(hours, since, now).mm,
    since: since.toISOString(),
    lastRainAt: last?.toISOString() ?? null,
    overnight: overnightLow(hours, latest.sunrise, now, park.timeZone),
    caution: rainCaution(rain24hMm, thresholdMm),
    thresholdMm,
  };
}

/** Rain per park-local day between two dates (inclusive), for the history page; days with no stored hours are absent. */
export async function rainPerDay(park: ParkRef, fromDate: string, toDate: string, now = new Date()): Promise<Map<string, DayRain>> {
  const from = parkLocalInstant(fromDate, "00:00", park.timeZone);
  const to = parkLocalInstant(shiftDate(toDate, 1), "00:00", park.timeZone);
  return rainByDay(await hoursBetween(park.id, from, to), now, park.timeZone);
}

/** The temperatures the pressure band uses when the rider types none: the forecast for the ride hours on the trail, now's at the pump. */
export type RideTemperatures = { trailC: number; pumpC: number; hours: RideHours; measuredAt: string; stale: boolean };

export async function rideTemperatures(park: ParkRef, hours: RideHours = DEFAULT_RIDE_HOURS, now = new Date()): Promise<RideTemperatures | null> {
  const latest = await ParkWeather.findByPk(park.id);
  if (!latest?.fetchedAt || latest.temperatureNowC === null || !latest.measuredAt) return null;
  const today = parkLocalDate(now, park.timeZone);
  const dayHours = await hoursBetween(park.id, parkLocalInstant(today, "00:00", park.timeZone), parkLocalInstant(shiftDate(today, 1), "00:00", park.timeZone));
  const trailC = meanForHours(dayHours, today, hours, park.timeZone);
  if (trailC === null) return null;
  return { trailC, pumpC: latest.temperatureNowC, hours, measuredAt: latest.measuredAt.toISOString(), stale: isStale(latest.fetchedAt, now) };
}
