import { parkLocalDate } from "@/lib/time";
import { TrailReport } from "@/models";

/** Today's date at the park, in the park's own time zone. */
export const parkToday = (park: { timeZone: string }, now = new Date()) => parkLocalDate(now, park.timeZone);

/**
 * The current revision of each trail's report for one park-local date, keyed by trail id:
 * one indexed query (trail_reports_board) whatever the number of trails.
 */
export async function currentReportsByTrail(parkId: string, reportDate: string): Promise<Map<string, TrailReport>> {
  const rows = await TrailReport.findAll({ where: { parkId, reportDate, isCurrent: true } });
  return new Map(rows.map((r) => [r.trailId, r]));
}
