/** A month at a glance: weeks (Monday first) of YYYY-MM-DD dates, null outside the month. */
import { shiftDate } from "@/lib/shared/park-clock";

export function monthGrid(month: string): (string | null)[][] {
  const first = `${month}-01`;
  const weekday = (new Date(`${first}T12:00:00Z`).getUTCDay() + 6) % 7; // Monday = 0
  const cells: (string | null)[] = Array.from({ length: weekday }, () => null);
  for (let date = first; date.startsWith(month); date = shiftDate(date, 1)) cells.push(date);
  while (cells.length % 7) cells.push(null);
  return Array.from({ length: cells.length / 7 }, (_, w) => cells.slice(w * 7, w * 7 + 7));
}

export function shiftMonth(month: string, by: number): string {
  const [y, m] = month.split("-").map(Number);
  const d = new Date(Date.UTC(y, m - 1 + by, 1));
  return d.toISOString().slice(0, 7);
}

export const isMonth = (value: unknown): value is string => typeof value === "string" && /^\d{4}-(0[1-9]|1[0-2])$/.test(value);
