import { parkLocalTime } from "@/lib/shared/park-clock";
import { toCsv } from "@/lib/shared/csv";

export type CsvReport = {
  date: string;
  trailName: string;
  difficulty: string;
  status: string;
  reason: string | null;
  surfaces: string[];
  features: { berms?: string; jumps?: string; wood?: string };
  note: string | null;
  reporterName: string | null;
  reportedAt: string;
  revision: number;
};

export const REPORT_CSV_HEADER = ["date", "trail", "difficulty", "status", "reason", "surfaces", "berms", "jumps", "wood", "note", "reporter", "inspected_at", "revision"];

/** One record per current report; times in the park's own clock, surfaces separated by "; ". */
export function reportsCsv(rows: CsvReport[], timeZone: string): string {
  return toCsv(
    REPORT_CSV_HEADER,
    rows.map((r) => [
      r.date,
      r.trailName,
      r.difficulty,
      r.status,
      r.reason,
      r.surfaces.join("; "),
      r.features.berms,
      r.features.jumps,
      r.features.wood,
      r.note,
      r.reporterName,
      parkLocalTime(new Date(r.reportedAt), timeZone),
      r.revision,
    ]),
  );
}
