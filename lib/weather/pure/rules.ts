/**
 * Rules over stored weather hours, in park time. No I/O: every rule takes the hours and "now".
 * An hour counts once it has ended (`at <= now`): its rain has fallen.
 */
import { parkLocalDate, parkLocalInstant, parkLocalTime, shiftDate } from "@/lib/shared/park-clock";
import type { WeatherHour } from "./types";

/** Rain below this (mm in an hour) is not "rain": Open-Meteo reports to 0.1 mm. */
export const RAIN_TRACE_MM = 0.1;
/** Air frost: air at screen height below 0 °C (common definition, e.g. the UK Met Office's "air frost"). */
export const FROST_BELOW_C = 0;
/** Stored values older than this are shown as stale, with their age (two missed 30-minute fetches and a margin). */
export const STALE_AFTER_MS = 90 * 60_000;

const round1 = (x: number) => Math.round(x * 10) / 10;
const ended = (hours: WeatherHour[], now: Date) => hours.filter((h) => h.at.getTime() <= now.getTime());

/** Rain (mm) in the hours that ended after `since` and by `now`; `missing` counts hours without a value. */
export function rainBetween(hours: WeatherHour[], since: Date, now: Date): { mm: number; hours: number; missing: number } {
  const inside = ended(hours, now).filter((h) => h.at.getTime() > since.getTime());
  const known = inside.filter((h) => h.precipitationMm !== null);
  return { mm: round1(known.reduce((sum, h) => sum + (h.precipitationMm ?? 0), 0)), hours: inside.length, missing: inside.length - known.length };
}

/** The end of the latest hour with rain, up to now; null when none of the hours had any. */
export function lastRainAt(hours: WeatherHour[], now: Date): Date | null {
  const wet = ended(hours, now).filter((h) => (h.precipitationMm ?? 0) >= RAIN_TRACE_MM);
  return wet.length ? new Date(Math.max(...wet.map((h) => h.at.getTime()))) : null;
}

/** Yesterday 18:00 park time: "since yesterday evening", the ranger's natural window. */
export function yesterdayEvening(now: Date, timeZone: string): Date {
  return parkLocalInstant(shiftDate(parkLocalDate(now, timeZone), -1), "18:00", timeZone);
}

/**
 * The night's lowest temperature, from yesterday 18:00 to sunrise (or now, if earlier), and
 * whether it was an air frost. Null when no hour of the night has a temperature.
 */
export function overnightLow(hours: WeatherHour[], sunrise: Date | null, now: Date, timeZone: string): { minC: number; frost: boolean } | null {
  const from = yesterdayEvening(now, timeZone).getTime();
  const to = Math.min(now.getTime(), sunrise?.getTime() ?? now.getTime());
  const temps = hours.filter((h) => h.at.getTime() >= from && h.at.getTime() <= to && h.temperatureC !== null).map((h) => h.temperatureC as number);
  if (temps.length === 0) return null;
  const minC = Math.min(...temps);
  return { minC, frost: minC < FROST_BELOW_C };
}

/** The hours stamped on a park-local date (00:00 … 23:00), forecast included. */
const onDate = (hours: WeatherHour[], date: string, timeZone: string) => hours.filter((h) => parkLocalDate(h.at, timeZone) === date);

/** Today's lowest and highest temperature (measured and forecast), or null without values. */
export function dayRange(hours: WeatherHour[], date: string, timeZone: string): { minC: number; maxC: number } | null {
  const temps = onDate(hours, date, timeZone).flatMap((h) => (h.temperatureC === null ? [] : [h.temperatureC]));
  return temps.length ? { minC: Math.min(...temps), maxC: Math.max(...temps) } : null;
}

/** Park-local whole hours, 0 … 23, chosen for riding: from and to both included. */
export type RideHours = { from: number; to: number };
export const DEFAULT_RIDE_HOURS: RideHours = { from: 10, to: 14 };

/** The mean temperature of the hourly values stamped from `from`:00 to `to`:00 on `date`, park time (both ends included); null without values. */
export function meanForHours(hours: WeatherHour[], date: string, ride: RideHours, timeZone: string): number | null {
  const temps = onDate(hours, date, timeZone)
    .filter((h) => {
      const hour = Number(parkLocalTime(h.at, timeZone).slice(0, 2));
      return hour >= ride.from && hour <= ride.to;
    })
    .flatMap((h) => (h.temperatureC === null ? [] : [h.temperatureC]));
  return temps.length ? round1(temps.reduce((a, b) => a + b, 0) / temps.length) : null;
}

/** A day's rain, and whether it is only part of the day (today so far). */
export type DayRain = { mm: number; partial: boolean };

/**
 * Rain per park-local day. An hour belongs to the day it fell in: the hour ending at 00:00
 * belongs to the day before. A past day counts only with 23 or more known hours (a day has 23 to
 * 25 at daylight-saving changes), so a day with a few stored hours never reads as dry; today counts
 * from its first hour, marked partial.
 */
export function rainByDay(hours: WeatherHour[], now: Date, timeZone: string): Map<string, DayRain> {
  const sums = new Map<string, { mm: number; hours: number }>();
  for (const h of ended(hours, now)) {
    if (h.precipitationMm === null) continue;
    const day = parkLocalDate(new Date(h.at.getTime() - 1), timeZone);
    const sum = sums.get(day) ?? { mm: 0, hours: 0 };
    sums.set(day, { mm: sum.mm + h.precipitationMm, hours: sum.hours + 1 });
  }
  const today = parkLocalDate(now, timeZone);
  const days = new Map<string, DayRain>();
  for (const [day, sum] of sums) {
    if (day === today) days.set(day, { mm: round1(sum.mm), partial: true });
    else if (sum.hours >= 23) days.set(day, { mm: round1(sum.mm), partial: false });
  }
  return days;
}

/** The park's caution level, reached or passed: a prompt for the ranger, never a status change. */
export function rainCaution(rain24hMm: number, thresholdMm: number): string | null {
  if (rain24hMm < thresholdMm) return null;
  return `${round1(rain24hMm)} mm in the last 24 h reaches the park's caution level of ${round1(thresholdMm)} mm. Check wet trails before opening them; the status stays your call.`;
}

export const isStale = (fetchedAt: Date, now: Date) => now.getTime() - fetchedAt.getTime() > STALE_AFTER_MS;

/** "12 min", "3 h 5 min", "2 days": how old stored values are. */
export function ageText(from: Date, now: Date): string {
  const minutes = Math.max(0, Math.round((now.getTime() - from.getTime()) / 60_000));
  if (minutes < 60) return `${minutes} min`;
  if (minutes < 48 * 60) return `${Math.floor(minutes / 60)} h${minutes % 60 ? ` ${minutes % 60} min` : ""}`;
  return `${Math.floor(minutes / 1440)} days`;
}
