/**
 * A form's `datetime-local` value ("2026-06-14T10:00") means that wall-clock time at the
 * park, whatever the browser's or server's zone. These turn it into an instant and back.
 */
const LOCAL = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/;

/** How far the park's wall clock is ahead of UTC at `instantMs`. */
function zoneOffsetMs(instantMs: number, timeZone: string): number {
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

/** The instant a park-local wall-clock time names, or null when the text is not one. */
export function parkLocalToInstant(local: string, timeZone: string): Date | null {
  const m = LOCAL.exec(local.trim());
  if (!m) return null;
  const [, y, mo, d, h, mi] = m.map(Number);
  const wallAsUtc = Date.UTC(y, mo - 1, d, h, mi);
  if (new Date(wallAsUtc).getUTCDate() !== d) return null;
  // Two passes settle on the right offset even next to a daylight-saving change.
  let instant = wallAsUtc - zoneOffsetMs(wallAsUtc, timeZone);
  instant = wallAsUtc - zoneOffsetMs(instant, timeZone);
  return new Date(instant);
}

/** The `datetime-local` value showing `instant` on the park's wall clock. */
export function instantToParkLocal(instant: Date, timeZone: string): string {
  return new Date(instant.getTime() + zoneOffsetMs(instant.getTime(), timeZone)).toISOString().slice(0, 16);
}
