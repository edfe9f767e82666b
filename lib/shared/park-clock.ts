/**
 * The park clock: every park-local date and wall-clock conversion, on Temporal (temporal-polyfill).
 * "Today" at a park is decided by the park's IANA time zone, not the server's or the browser's.
 *
 * A wall-clock time is turned into an instant with Temporal's "compatible" disambiguation (the
 * behaviour of RFC 5545 calendars and of `Date`): a time inside a spring-forward gap moves later by
 * the gap's length (02:30 on a night that jumps from 02:00 to 03:00 becomes 03:30), and a time an
 * autumn change repeats takes the earlier of its two instants.
 */
import { Temporal } from "temporal-polyfill";

const zoned = (instant: Date, timeZone: string) => Temporal.Instant.fromEpochMilliseconds(instant.getTime()).toZonedDateTimeISO(timeZone);

/** The park's calendar date at an instant, as YYYY-MM-DD. */
export function parkLocalDate(instant: Date, timeZone: string): string {
  return zoned(instant, timeZone).toPlainDate().toString();
}

/** The park's wall-clock time at an instant, as HH:MM (24-hour). */
export function parkLocalTime(instant: Date, timeZone: string): string {
  return zoned(instant, timeZone).toPlainTime().toString({ smallestUnit: "minute" });
}

/** The calendar date `days` before or after a YYYY-MM-DD date. */
export function shiftDate(date: string, days: number): string {
  return Temporal.PlainDate.from(date).add({ days }).toString();
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
  return zoned(instant, timeZone).toPlainDateTime().toString({ smallestUnit: "minute" });
}
