import "server-only";
import { reportValues } from "@/lib/conditions/report-view";
import type { ReportInput } from "@/lib/conditions/pure/schemas";
import { Trail, type Park } from "@/models";
import { currentReportsByTrail, latestReportsBefore, parkToday } from "./park-today";

export type CheckTrail = {
  id: string;
  name: string;
  difficulty: string;
  kind: string;
  /** The revision a save must start from: today's current one, or 0. */
  baseRevision: number;
  inspectedToday: boolean;
  /** Values offered as the start: today's report if there is one, else the latest earlier one. */
  start: ReportInput | null;
  startDate: string | null;
};

export type MorningCheckStart = { date: string; trails: CheckTrail[] };

/** Everything the morning-check screen needs, in three queries whatever the number of trails. */
export async function morningCheckStart(park: Park, now = new Date()): Promise<MorningCheckStart> {
  const date = parkToday(park, now);
  const [trails, today, earlier] = await Promise.all([
    Trail.findAll({ where: { parkId: park.id, archivedAt: null }, attributes: ["id", "name", "difficulty", "kind"], order: [["name", "ASC"]] }),
    currentReportsByTrail(park.id, date),
    latestReportsBefore(park.id, date),
  ]);
  return {
    date,
    trails: trails.map((t) => {
      const current = today.get(t.id);
      const start = current ?? earlier.get(t.id);
      return {
        id: t.id,
        name: t.name,
        difficulty: t.difficulty,
        kind: t.kind,
        baseRevision: current?.revision ?? 0,
        inspectedToday: Boolean(current),
        start: start ? reportValues(start) : null,
        startDate: start?.reportDate ?? null,
      };
    }),
  };
}
