import type { Metadata } from "next";
import Link from "next/link";
import { formatCalendarDate } from "@/lib/shared/park-clock";
import { ParkStateForm } from "@/components/morning-check/park-state-form";
import { MorningCheckForm } from "@/components/morning-check/check-form";
import { getActor } from "@/lib/server/auth/actor";
import { activeParkState } from "@/lib/conditions/park-state";
import { requireParkAccess } from "@/lib/parks/queries";
import { morningCheckStart } from "@/lib/conditions/morning-check-start";
import { WeatherPanel } from "@/components/weather/weather-panel";
import { parkWeather } from "@/lib/weather/park-weather";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Morning check" };

/** The ranger's morning check on a phone: every trail as one compact row, one save. */
export default async function MorningCheckPage({ params }: { params: Promise<{ parkSlug: string }> }) {
  const { parkSlug } = await params;
  const [actor, park] = await Promise.all([getActor(), requireParkAccess(parkSlug, "report:write")]);
  const [start, active, weather] = await Promise.all([morningCheckStart(park), activeParkState(park.id), parkWeather(park)]);
  return (
    <section className="space-y-4">
      <header>
        <h1 className="text-2xl font-bold">Morning check</h1>
        <p className="text-loam-700">
          {park.name} · {formatCalendarDate(start.date, "long")}. <strong>Unchanged</strong> keeps a trail as it was; <strong>Change</strong> sets what you found. Save once at the end.
        </p>
        <p className="mt-1 flex flex-wrap gap-x-4 text-sm font-semibold">
          <Link href={`/parks/${park.slug}`} className="inline-flex min-h-tap items-center text-moss-700 underline">
            Public board
          </Link>
          <Link href={`/staff/${park.slug}/hazards`} className="inline-flex min-h-tap items-center text-moss-700 underline">
            Pin a hazard
          </Link>
        </p>
      </header>
      <WeatherPanel weather={weather} timeZone={park.timeZone} variant="check" />
      <ParkStateForm parkSlug={park.slug} active={active} />
      {start.trails.length === 0 ? <p className="card">This park has no trails yet.</p> : <MorningCheckForm parkSlug={park.slug} start={start} />}
    </section>
  );
}
