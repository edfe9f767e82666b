/**
 * A form's `datetime-local` value ("2026-06-14T10:00") means that wall-clock time at the
 * park, whatever the browser's or server's zone. These turn it into an instant and back.
 */
import { zoneOffsetMs } from "@/lib/shared/time";

const LOCAL = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/;

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
