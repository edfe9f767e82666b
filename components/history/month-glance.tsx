import Link from "next/link";
import { monthGrid, shiftMonth } from "@/lib/conditions/pure/calendar";
import { STATUS_LABELS, STATUS_SIGNS } from "@/lib/conditions/pure/labels";
import type { ReportStatus } from "@/lib/conditions/pure/vocabulary";

const CELL: Record<ReportStatus, string> = {
  open: "border-2 border-solid border-moss-600 bg-moss-100",
  caution: "border-2 border-dashed border-flare-500 bg-flare-100",
  closed: "border-2 border-solid border-brick-600 bg-brick-100",
};
const WEEKDAYS = ["Mon", "Tue", "Wed", "Thu", "Fri", "Sat", "Sun"];

/** A month at a glance: each day's status as a sign and a pattern (not colour alone). */
export function MonthGlance({ month, statusByDate, hrefForMonth, today }: { month: string; statusByDate: Map<string, ReportStatus>; hrefForMonth: (m: string) => string; today: string }) {
  const title = new Intl.DateTimeFormat("en-GB", { month: "long", year: "numeric", timeZone: "UTC" }).format(new Date(`${month}-15T12:00:00Z`));
  return (
    <section className="card space-y-2" aria-labelledby="month-title">
      <div className="flex items-center justify-between">
        <Link href={hrefForMonth(shiftMonth(month, -1))} className="btn-quiet" aria-label="Previous month">
          ‹
        </Link>
        <h2 id="month-title" className="text-lg font-bold">
          {title}
        </h2>
        <Link href={hrefForMonth(shiftMonth(month, 1))} className="btn-quiet" aria-label="Next month">
          ›
        </Link>
      </div>
      <table className="w-full table-fixed text-center text-sm" data-testid="month-glance">
        <thead>
          <tr>
            {WEEKDAYS.map((d) => (
              <th key={d} scope="col" className="py-1 font-semibold text-loam-600">
                {d}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {monthGrid(month).map((week, w) => (
            <tr key={w}>
              {week.map((date, d) => {
                const status = date ? statusByDate.get(date) : undefined;
                // YYYY-MM-DD strings compare as dates: a day after today has no report yet, it is not "no report".
                const future = date !== null && date > today;
                return (
                  <td key={d} className="p-0.5">
                    {date && (
                      <div
                        className={`flex h-12 flex-col items-center justify-center rounded ${status ? CELL[status] : future ? "border border-dashed border-loam-200" : "border border-loam-200"} ${date === today ? "outline-2 outline-loam-900" : ""}`}
                        style={status === "closed" ? { backgroundImage: "repeating-linear-gradient(135deg, #f8e1dc 0 5px, #ffffff 5px 9px)" } : undefined}
                        title={status ? `${date}: ${STATUS_LABELS[status]}` : future ? `${date}: still to come` : `${date}: no report`}
                      >
                        <span className="text-xs">{Number(date.slice(8))}</span>
                        <span aria-hidden="true" className="font-bold">
                          {status ? STATUS_SIGNS[status] : future ? "" : "·"}
                        </span>
                        <span className="sr-only">{status ? STATUS_LABELS[status] : future ? "still to come" : "no report"}</span>
                      </div>
                    )}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="text-xs text-loam-600">✓ open · ! caution · ✕ closed · · no report</p>
    </section>
  );
}
