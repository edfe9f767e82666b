/**
 * The instant a park-local wall-clock time happens: "06:42 on 2026-12-02 at Harrow Ridge".
 * Used by the demo seeder and tests to place reports on the park's own clock.
 */
function offsetMs(instant: Date, timeZone: string): number {
  const parts = new Intl.DateTimeFormat("en-US", {
    timeZone,
    hourCycle: "h23",
    year: "numeric",
    month: "2-digit",
    day: "2-digit",
    hour: "2-digit",
    minute: "2-digit",
    second: "2-digit",
  }).formatToParts(instant);
  const get = (type: string) => Number(parts.find((p) => p.type === type)?.value);
  const asUtc = Date.UTC(get("year"), get("month") - 1, get("day"), get("hour"), get("minute"), get("second"));
  return asUtc - Math.floor(instant.getTime() / 1000) * 1000;
}

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
