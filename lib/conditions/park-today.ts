import "server-only";
import { parkLocalDate } from "@/lib/shared/park-clock";
import { TrailReport, sequelize } from "@/models";

/** Today's date at the park, in the park's own time zone. */
export const parkToday = (park: { timeZone: string }, now = new Date()) => parkLocalDate(now, park.timeZone);

/**
 * The current revision of each trail's report for one park-local date, keyed by trail id:
 * one indexed query (trail_reports_board) whatever the number of trails.
 */
export async function currentReportsByTrail(parkId: string, reportDate: string, read: { useMaster?: boolean } = {}): Promise<Map<string, TrailReport>> {
  const rows = await TrailReport.findAll({ where: { parkId, reportDate, isCurrent: true }, ...read });
  return new Map(rows.map((r) => [r.trailId, r]));
}

/**
 * Each trail's latest current report before a date (yesterday's, or the last day it was
 * inspected), keyed by trail id: one query using DISTINCT ON over the board index.
 */
export async function latestReportsBefore(parkId: string, reportDate: string): Promise<Map<string, TrailReport>> {
  const rows = await sequelize.query(
    `SELECT DISTINCT ON (trail_id) * FROM trail_reports
     WHERE park_id = $1 AND is_current AND report_date < $2
     ORDER BY trail_id, report_date DESC`,
    { bind: [parkId, reportDate], model: TrailReport, mapToModel: true },
  );
  return new Map(rows.map((r) => [r.trailId, r]));
}
