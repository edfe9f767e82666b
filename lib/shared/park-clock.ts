/**
 * The park clock: every park-local date and wall-clock conversion, on Temporal (temporal-polyfill).
 * "Today" at a park is decided by the park's IANA time zone, not the server's or the browser's.
 *
 * A wall-clock time is turned into an instant with Temporal's "compatible" disambiguation (the
 * behaviour of RFC 5545 calendars and of `Date`): a time inside a spring-forward gap moves later by
 * the gap's length (02:30 on a night that jumps from 02:00 to 03:00 becomes 03:30), and a time an
 * autumn change repeats takes the earlier of its two instants.
 *
 * The other direction, an instant read on the park's clock, has exactly one answer; it uses Intl,
 * which every browser has, so client pages that only show times (the board) do not ship the polyfill.
 */
import { Temporal } from "temporal-polyfill";

/** The park's wall clock at an instant: YYYY-MM-DD and HH:MM (24-hour). */
function wallClock(instant: Date, timeZone: string): { date: string; time: string } {
  const parts = new Intl.DateTimeFormat("en-US", { timeZone, hourCycle: "h23", year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit" }).formatToParts(instant);
  const get = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)!.value;
  return { date: `${get("year")}-${get("month")}-${get("day")}`, time: `${get("hour")}:${get("minute")}` };
}

/** The park's calendar date at an instant, as YYYY-MM-DD. */
export const parkLocalDate = (instant: Date, timeZone: string): string => wallClock(instant, timeZone).date;

/** The park's wall-clock time at an instant, as HH:MM (24-hour). */
export const parkLocalTime = (instant: Date, timeZone: string): string => wallClock(instant, timeZone).time;

/** The calendar date `days` before or after a YYYY-MM-DD date (calendar arithmetic: no zone involved). */
export function shiftDate(date: string, days: number): string {
  const d = new Date(`${date}T12:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

/** True for a time-zone name Temporal (and so the IANA database shipped with the runtime) knows. */
export function isValidTimeZone(timeZone: string): boolean {
  try {
    Temporal.Instant.fromEpochMilliseconds(0).toZonedDateTimeISO(timeZone);
    return true;
  } catch {
    return false;
  }
}

/** The instant a park-local date and time (HH:MM or HH:MM:SS) happen: "06:42 on 2026-12-02 at the park". */
export function parkLocalInstant(date: string, time: string, timeZone: string): Date {
  const wall = Temporal.PlainDateTime.from(`${date}T${time}`, { overflow: "reject" });
  return new Date(wall.toZonedDateTime(timeZone, { disambiguation: "compatible" }).epochMilliseconds);
}

const LOCAL_FIELD = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/;

/** A form's `datetime-local` value ("2026-06-14T10:00") read as that wall-clock time at the park; null when it is not one. */
export function parkLocalToInstant(local: string, timeZone: string): Date | null {
  const text = local.trim();
  if (!LOCAL_FIELD.test(text)) return null;
  try {
    const [date, time] = text.split("T");
    return parkLocalInstant(date, time, timeZone);
  } catch {
    return null; // a date that does not exist (30 February) or an hour past 23
  }
}

/** The `datetime-local` value showing an instant on the park's wall clock. */
export function instantToParkLocal(instant: Date, timeZone: string): string {
  const { date, time } = wallClock(instant, timeZone);
  return `${date}T${time}`;
}

/**
 * One style for every date and time a reader sees, always in the park's zone (never the
 * server's), through Intl.DateTimeFormat: "Wed 2 Dec, 07:42", "Wed 2 Dec", "Wednesday 2 December".
 * The locale is a parameter so a page that knows the reader's can pass it.
 */
export const DISPLAY_LOCALE = "en-GB";

export function formatParkDateTime(instant: Date, timeZone = "UTC", locale = DISPLAY_LOCALE): string {
  return new Intl.DateTimeFormat(locale, { timeZone, weekday: "short", day: "numeric", month: "short", hour: "2-digit", minute: "2-digit", hourCycle: "h23" }).format(instant);
}

export function formatParkDay(instant: Date, timeZone: string, locale = DISPLAY_LOCALE): string {
  return new Intl.DateTimeFormat(locale, { timeZone, weekday: "short", day: "numeric", month: "short" }).format(instant);
}

/** A calendar date (YYYY-MM-DD, already the park's) in words; read at noon UTC so no zone can move it a day. */
export function formatCalendarDate(date: string, style: "short" | "long" = "short", locale = DISPLAY_LOCALE): string {
  const options: Intl.DateTimeFormatOptions = style === "long" ? { weekday: "long", day: "numeric", month: "long" } : { weekday: "short", day: "numeric", month: "short", year: "numeric" };
  return new Intl.DateTimeFormat(locale, { ...options, timeZone: "UTC" }).format(new Date(`${date}T12:00:00Z`));
}

/** "Wednesday 2 December" for a YYYY-MM-DD park-local date. */
export const longDate = (date: string) => formatCalendarDate(date, "long");
