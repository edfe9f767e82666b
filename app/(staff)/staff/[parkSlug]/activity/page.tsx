import type { Metadata } from "next";
import Link from "next/link";
import { getActor } from "@/lib/server/auth/actor";
import { can } from "@/lib/server/auth/permissions";
import { setupEvents, statusChanges } from "@/lib/audit/activity";
import { parkToday } from "@/lib/conditions/park-today";
import { parkLocalTime, shiftDate } from "@/lib/shared/park-clock";
import { requireParkAccess } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Status changes" };

type Props = { params: Promise<{ parkSlug: string }>; searchParams: Promise<{ before?: string }> };

/** Staff: the audit log of every trail status change, and the CSV export of reports. */
export default async function ActivityPage({ params, searchParams }: Props) {
  const [{ parkSlug }, query, actor] = await Promise.all([params, searchParams, getActor()]);
  const park = await requireParkAccess(parkSlug, "audit:read");
  const before = Number(query.before);
  const [{ changes, olderBefore }, teamEvents] = await Promise.all([statusChanges(park.id, { before: Number.isSafeInteger(before) && before > 0 ? before : undefined }), setupEvents(park.id)]);
  const today = parkToday(park);
  const day = (iso: string) => new Intl.DateTimeFormat("en-GB", { timeZone: park.timeZone, day: "numeric", month: "short" }).format(new Date(iso));
  return (
    <section className="space-y-4">
      <header>
        <h1 className="text-2xl font-bold">Status changes at {park.name}</h1>
        <p className="text-sm text-loam-700">Every change of a trail&apos;s status, newest first. Times are park time.</p>
      </header>
      {can(actor, "reports:export", { parkId: park.id }) && (
        <form method="get" action={`/api/parks/${park.slug}/reports.csv`} className="card flex flex-wrap items-end gap-2">
          <h2 className="w-full text-lg font-bold">Export reports (CSV)</h2>
          <div>
            <label htmlFor="csv-from" className="label">From</label>
            <input id="csv-from" name="from" type="date" className="field" defaultValue={shiftDate(today, -29)} />
          </div>
          <div>
            <label htmlFor="csv-to" className="label">To</label>
            <input id="csv-to" name="to" type="date" className="field" defaultValue={today} />
          </div>
          <button type="submit" className="btn-quiet">Download CSV</button>
        </form>
      )}
      <div className="card overflow-x-auto">
        {changes.length === 0 ? (
          <p>No status changes yet.</p>
        ) : (
          <table className="w-full min-w-[560px] text-left text-sm" data-testid="activity">
            <thead>
              <tr className="border-b-2 border-loam-300">
                <th scope="col" className="px-2 py-1">When</th>
                <th scope="col" className="px-2 py-1">Trail</th>
                <th scope="col" className="px-2 py-1">Change</th>
                <th scope="col" className="px-2 py-1">Reason</th>
                <th scope="col" className="px-2 py-1">By</th>
              </tr>
            </thead>
            <tbody>
              {changes.map((c) => (
                <tr key={c.id} className="border-b border-loam-100 align-top">
                  <td className="px-2 py-2 whitespace-nowrap">
                    {day(c.at)} {parkLocalTime(new Date(c.at), park.timeZone)}
                  </td>
                  <td className="px-2 py-2">
                    {c.trailId ? <Link href={`/trails/${c.trailId}/history`} className="underline">{c.trailName}</Link> : c.trailName}
                  </td>
                  <td className="px-2 py-2 font-semibold">
                    {c.from ?? "no report"} → {c.to}
                  </td>
                  <td className="px-2 py-2">{c.reason ?? ""}</td>
                  <td className="px-2 py-2">{c.actorName ?? "(removed account)"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
        {olderBefore && (
          <Link href={`/staff/${park.slug}/activity?before=${olderBefore}`} className="btn-quiet mt-3">
            Older changes
          </Link>
        )}
      </div>
      <section className="card space-y-2" aria-labelledby="team-activity">
        <h2 id="team-activity" className="text-lg font-bold">Team, settings and ground</h2>
        {teamEvents.length === 0 ? (
          <p>No changes yet.</p>
        ) : (
          <ul className="divide-y divide-loam-100 text-sm" data-testid="setup-activity">
            {teamEvents.map((e) => (
              <li key={e.id} className="py-2">
                <span className="block text-loam-600">{day(e.at)} {parkLocalTime(new Date(e.at), park.timeZone)} · {e.actorName ?? "(removed account)"}</span>
                {e.text}
              </li>
            ))}
          </ul>
        )}
      </section>
    </section>
  );
}
