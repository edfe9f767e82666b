/**
 * The instant a park-local wall-clock time happens: "06:42 on 2026-12-02 at Harrow Ridge".
 * Used by the demo seeder and tests to place reports on the park's own clock.
 */
import { zoneOffsetMs } from "@/lib/shared/time";

const offsetMs = (instant: Date, timeZone: string) => zoneOffsetMs(instant.getTime(), timeZone);

/**
 * A wall-clock time that happens twice (autumn) resolves to the first; one that does not exist
 * (skipped in spring) lands just after the gap, as a clock moved forward would read.
 */
export function parkLocalInstant(date: string, time: string, timeZone: string): Date {
  const wall = Date.parse(`${date}T${time.length === 5 ? `${time}:00` : time}Z`);
  const firstOffset = offsetMs(new Date(wall), timeZone);
  const first = wall - firstOffset;
  const secondOffset = offsetMs(new Date(first), timeZone);
  if (secondOffset === firstOffset) return new Date(first);
  const second = wall - secondOffset;
  if (offsetMs(new Date(second), timeZone) === secondOffset) return new Date(second);
  return new Date(Math.max(first, second));
}
