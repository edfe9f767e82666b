/**
 * Park-local dates. "Today" at a park is decided by the park's IANA time zone, not the
 * server's: a report at 23:30 and one at 00:30 park time land on different dates.
 */
export function parkLocalDate(instant: Date, timeZone: string): string {
  // en-CA formats as YYYY-MM-DD.
  return new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(instant);
}

export function parkLocalTime(instant: Date, timeZone: string): string {
  return new Intl.DateTimeFormat("en-GB", { timeZone, hour: "2-digit", minute: "2-digit", hourCycle: "h23" }).format(instant);
}

/** The calendar date `days` before or after a YYYY-MM-DD date. */
export function shiftDate(date: string, days: number): string {
  const d = new Date(`${date}T12:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

export function isValidTimeZone(timeZone: string): boolean {
  try {
    new Intl.DateTimeFormat("en", { timeZone });
    return true;
  } catch {
    return false;
  }
}

/** How far the park's wall clock is ahead of UTC at `instantMs`, in milliseconds. */
export function zoneOffsetMs(instantMs: number, timeZone: string): number {
  const parts = new Intl.DateTimeFormat("en-US", {
    timeZone,
    hourCycle: "h23",
    year: "numeric",
    month: "2-digit",
    day: "2-digit",
    hour: "2-digit",
    minute: "2-digit",
    second: "2-digit",
  }).formatToParts(new Date(instantMs));
  const get = (type: string) => Number(parts.find((p) => p.type === type)?.value);
  const wall = Date.UTC(get("year"), get("month") - 1, get("day"), get("hour"), get("minute"), get("second"));
  return wall - Math.floor(instantMs / 1000) * 1000;
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
