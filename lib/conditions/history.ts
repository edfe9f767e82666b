import "server-only";
import { Op } from "sequelize";
import { reportView, type ReportView } from "@/lib/conditions/report-view";
import { AppError } from "@/lib/shared/errors";
import { shiftDate } from "@/lib/shared/park-clock";
import { dateRangeSchema } from "@/lib/conditions/pure/schemas";
import { Trail, TrailReport, User } from "@/models";
import { parkToday } from "./park-today";

export const DEFAULT_RANGE_DAYS = 30;
export const MAX_RANGE_DAYS = 366;

const daysBetween = (from: string, to: string) => Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000);

/** ?from=&to= with defaults (the last 30 days to today at the park) and a one-year cap. */
export function resolveRange(query: { from?: string | null; to?: string | null }, park: { timeZone: string }, now = new Date()) {
  const parsed = dateRangeSchema.parse({ from: query.from || undefined, to: query.to || undefined });
  const to = parsed.to ?? parkToday(park, now);
  const from = parsed.from ?? shiftDate(to, -(DEFAULT_RANGE_DAYS - 1));
  if (from > to) throw new AppError(400, "from must not be after to.", "from");
  if (daysBetween(from, to) >= MAX_RANGE_DAYS) throw new AppError(422, `Ask for at most ${MAX_RANGE_DAYS} days at a time.`, "from");
  return { from, to };
}

/** A report outlives its author's account: a deleted account reads as this. */
export const FORMER_STAFF = "former staff member";
const reporterLabel = (reporter: User | null | undefined) => reporter?.name ?? FORMER_STAFF;

export type HistoryRow = ReportView & { reporterName: string | null };

/**
 * A trail's reports between two dates, newest first: current revisions, or every revision for staff.
 * Who wrote each report (name and user id) is for the park's staff only (`staffView`).
 */
export async function trailReportHistory(trailId: string, range: { from: string; to: string }, allRevisions = false, staffView = false): Promise<HistoryRow[]> {
  const rows = await TrailReport.findAll({
    where: { trailId, reportDate: { [Op.between]: [range.from, range.to] }, ...(allRevisions ? {} : { isCurrent: true }) },
    include: [{ model: User, as: "reporter", attributes: ["name"] }],
    order: [
      ["reportDate", "DESC"],
      ["revision", "DESC"],
    ],
  });
  return rows.map((r) =>
    staffView ? { ...reportView(r), reporterName: reporterLabel((r as TrailReport & { reporter?: User }).reporter) } : { ...reportView(r), reporterId: null, reporterName: null },
  );
}

export type ExportRow = HistoryRow & { trailName: string; difficulty: string };

/** Current reports of every trail of a park between two dates, for the CSV export. */
export async function parkReportsForExport(parkId: string, range: { from: string; to: string }): Promise<ExportRow[]> {
  const rows = await TrailReport.findAll({
    where: { parkId, isCurrent: true, reportDate: { [Op.between]: [range.from, range.to] } },
    include: [
      { model: User, as: "reporter", attributes: ["name"] },
      { model: Trail, as: "trail", attributes: ["name", "difficulty"] },
    ],
    order: [
      ["reportDate", "ASC"],
      [{ model: Trail, as: "trail" }, "name", "ASC"],
    ],
  });
  return rows.map((r) => {
    const withJoins = r as TrailReport & { reporter?: User; trail: Trail };
    return { ...reportView(r), reporterName: reporterLabel(withJoins.reporter), trailName: withJoins.trail.name, difficulty: withJoins.trail.difficulty };
  });
}
