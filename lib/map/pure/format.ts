import { parkLocalDate, parkLocalTime, shiftDate, formatParkDay } from "@/lib/shared/park-clock";

/**
 * When something happened, in the park's own time zone: "today 07:12", "yesterday 18:40",
 * "Sat 28 Nov 07:12", or "never". Shared by the map card and the list.
 */
export function formatParkTime(iso: string | null, timeZone: string, now = new Date()): string {
  if (!iso) return "never";
  const at = new Date(iso);
  const [day, today] = [parkLocalDate(at, timeZone), parkLocalDate(now, timeZone)];
  const time = parkLocalTime(at, timeZone);
  if (day === today) return `today ${time}`;
  if (day === shiftDate(today, -1)) return `yesterday ${time}`;
  return `${formatParkDay(at, timeZone)} ${time}`;
}

/** "2.4 km" / "740 m". */
export function formatLength(metres: number): string {
  return metres < 1000 ? `${Math.round(metres)} m` : `${(metres / 1000).toFixed(1)} km`;
}

/** Today's surfaces in words, or a dash when nobody has reported them. */
export const formatSurfaces = (surfaces: string[]) => (surfaces.length ? surfaces.join(", ") : "not reported today");
