import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { DifficultyBadge } from "@/components/difficulty-badge";
import { HistoryTable } from "@/components/history/history-table";
import { MonthGlance } from "@/components/history/month-glance";
import { getActor } from "@/lib/server/auth/actor";
import { can } from "@/lib/server/auth/permissions";
import { isMonth, shiftMonth } from "@/lib/conditions/pure/calendar";
import { loadTrailWithPark } from "@/lib/conditions/write-report";
import { parkToday } from "@/lib/conditions/park-today";
import { resolveRange, trailReportHistory } from "@/lib/conditions/history";
import { AppError } from "@/lib/shared/errors";
import { shiftDate } from "@/lib/shared/park-clock";
import { WeatherAttribution } from "@/components/weather/weather-panel";
import { rainPerDay } from "@/lib/weather/park-weather";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Trail history" };

type Props = { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | undefined>> };

async function load(id: string) {
  try {
    return await loadTrailWithPark(id);
  } catch (error) {
    if (error instanceof AppError && error.status === 404) notFound();
    throw error;
  }
}

/** A trail's report history: a month at a glance and a table of reports (every revision for staff). */
export default async function TrailHistoryPage({ params, searchParams }: Props) {
  const [{ id }, query, actor] = await Promise.all([params, searchParams, getActor()]);
  const { trail, park } = await load(id);
  const today = parkToday(park);
  const month = isMonth(query.month) ? query.month : today.slice(0, 7);
  const monthEnd = shiftDate(`${shiftMonth(month, 1)}-01`, -1);
  const isStaff = can(actor, "audit:read", { parkId: park.id });
  const allRevisions = isStaff && query.revisions === "all";
  let range: { from: string; to: string };
  let rangeError: string | null = null;
  try {
    range = resolveRange({ from: query.from, to: query.to }, park);
  } catch (error) {
    rangeError = error instanceof AppError ? error.message : "Check the dates.";
    range = resolveRange({}, park);
  }
  const [monthRows, rows, rain] = await Promise.all([
    trailReportHistory(trail.id, { from: `${month}-01`, to: monthEnd }),
    trailReportHistory(trail.id, range, allRevisions, isStaff),
    rainPerDay(park, range.from, range.to),
  ]);
  const rainByDate = rain.size > 0 ? Object.fromEntries(rain) : undefined;
  const statusByDate = new Map(monthRows.map((r) => [r.date, r.status]));
  const base = `/trails/${trail.id}/history`;
  const keep = (extra: Record<string, string>) => `${base}?${new URLSearchParams({ ...(query.from ? { from: query.from } : {}), ...(query.to ? { to: query.to } : {}), month, ...extra })}`;

  return (
    <section className="space-y-4">
      <header className="space-y-1">
        <p className="text-sm">
          <Link href={`/parks/${park.slug}`} className="font-semibold text-moss-700 underline">
            {park.name}: today&apos;s board
          </Link>
        </p>
        <h1 className="text-2xl font-bold">{trail.name}: report history</h1>
        <DifficultyBadge difficulty={trail.difficulty} />
      </header>
      <MonthGlance month={month} statusByDate={statusByDate} hrefForMonth={(m) => keep({ month: m })} today={today} />
      <section className="card space-y-3" aria-labelledby="reports-title">
        <h2 id="reports-title" className="text-lg font-bold">
          Reports {range.from} to {range.to}
        </h2>
        <form method="get" className="flex flex-wrap items-end gap-2">
          <input type="hidden" name="month" value={month} />
          {allRevisions && <input type="hidden" name="revisions" value="all" />}
          <div>
            <label htmlFor="history-from" className="label">From</label>
            <input id="history-from" name="from" type="date" className="field" defaultValue={range.from} />
          </div>
          <div>
            <label htmlFor="history-to" className="label">To</label>
            <input id="history-to" name="to" type="date" className="field" defaultValue={range.to} />
          </div>
          <button type="submit" className="btn-quiet">Show</button>
        </form>
        {rangeError && <p role="alert" className="field-error">{rangeError}</p>}
        {isStaff && (
          <p className="text-sm">
            <Link href={keep(allRevisions ? {} : { revisions: "all" })} className="font-semibold text-moss-700 underline">
              {allRevisions ? "Show current reports only" : "Show every revision (staff)"}
            </Link>
          </p>
        )}
        {rows.length === 0 ? <p>No reports in these dates.</p> : <HistoryTable rows={rows} timeZone={park.timeZone} showRevisions={allRevisions} rainByDate={rainByDate} />}
        {rainByDate && (
          <p className="text-xs text-loam-700">
            Rain that day: the park-local day&apos;s total from the stored weather. <WeatherAttribution />
          </p>
        )}
      </section>
    </section>
  );
}
