/**
 * The weather in words, one copy for every page: the morning check's line, the board's, and the
 * pressure band's reason. Times are park time; "mm" to one decimal only when needed.
 */
import { parkLocalDate, parkLocalTime } from "@/lib/shared/park-clock";
import { formatTemperature } from "@/lib/shared/units";
import type { RideHours } from "./rules";

export const formatRain = (mm: number) => `${Number.isInteger(Number(mm.toFixed(1))) ? mm.toFixed(0) : mm.toFixed(1)} mm`;

/** "04:00", or "Tue 04:00" when not today at the park. */
export function parkClockText(iso: string, now: Date, timeZone: string): string {
  const at = new Date(iso);
  const time = parkLocalTime(at, timeZone);
  if (parkLocalDate(at, timeZone) === parkLocalDate(now, timeZone)) return time;
  const day = new Intl.DateTimeFormat("en-GB", { timeZone, weekday: "short" }).format(at);
  return `${day} ${time}`;
}

type CheckFacts = {
  rainSinceEveningMm: number;
  since: string;
  lastRainAt: string | null;
  nowC: number;
  overnight: { minC: number; frost: boolean } | null;
};

/** "Rain: 14 mm since yesterday 18:00, last in the hour to 04:00; 3 °C now, frost overnight (low −6 °C)". */
export function morningCheckLine(w: CheckFacts, now: Date, timeZone: string): string {
  const since = `since yesterday ${parkLocalTime(new Date(w.since), timeZone)}`;
  const rain =
    w.rainSinceEveningMm > 0
      ? `Rain: ${formatRain(w.rainSinceEveningMm)} ${since}${w.lastRainAt ? `, last in the hour to ${parkClockText(w.lastRainAt, now, timeZone)}` : ""}`
      : `No rain ${since}${w.lastRainAt ? ` (last in the hour to ${parkClockText(w.lastRainAt, now, timeZone)})` : ""}`;
  const night = w.overnight ? (w.overnight.frost ? `, frost overnight (low ${formatTemperature(w.overnight.minC)})` : `, overnight low ${formatTemperature(w.overnight.minC)}`) : "";
  return `${rain}; ${formatTemperature(w.nowC)} now${night}`;
}

/** "Today 3 °C to 8 °C · rain in the last 24 h: 14 mm". */
export function boardLine(w: { today: { minC: number; maxC: number } | null; rain24hMm: number; nowC: number }): string {
  const range = w.today ? `Today ${formatTemperature(w.today.minC)} to ${formatTemperature(w.today.maxC)}` : `${formatTemperature(w.nowC)} now`;
  return `${range} · rain in the last 24 h: ${formatRain(w.rain24hMm)}`;
}

/** When the values were measured, and how old they are when the worker has not updated them. */
export function measuredLine(w: { measuredAt: string; stale: boolean; age: string }, now: Date, timeZone: string): string {
  const at = parkClockText(w.measuredAt, now, timeZone);
  return w.stale ? `Last measured ${at} (${w.age} ago): newer weather could not be fetched yet` : `Measured ${at}`;
}

export const hourText = (h: number) => `${String(h).padStart(2, "0")}:00`;
export const rideHoursText = (hours: RideHours) => `${hourText(hours.from)}–${hourText(hours.to)}`;

/** The pressure band's reason: "8 °C forecast for 10:00–14:00, 3 °C now (measured 18:15, Open-Meteo): pump for the trail, not the car park". */
export function forecastReason(t: { trailC: number; pumpC: number; hours: RideHours }, measuredText: string): string {
  return `No temperatures typed, so the park's weather is used: ${formatTemperature(t.trailC)} forecast on the trail for ${rideHoursText(t.hours)}, ${formatTemperature(t.pumpC)} now where you pump (${measuredText}). Type your own to change them.`;
}
