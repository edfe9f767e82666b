import Link from "next/link";
import { RideLogForm } from "@/components/pressure/ride-log-form";
import { getActor } from "@/lib/server/auth/actor";
import { parkToday } from "@/lib/conditions/park-today";
import { listSetups } from "@/lib/setups/setup-queries";
import { trailsToday } from "@/lib/pressure/trails-today";
import { unitsFor } from "@/lib/accounts/units";
import { listParkRecords, type Park } from "@/lib/parks/queries";

export const metadata = { title: "Log a ride" };
export const dynamic = "force-dynamic";

export default async function NewRidePage({ searchParams }: { searchParams: Promise<{ park?: string }> }) {
  const [{ park: slug }, actor] = await Promise.all([searchParams, getActor()]);
  const [setups, units, parks] = await Promise.all([listSetups(actor), unitsFor(actor), listParkRecords()]);
  const park = slug === "none" ? null : (parks.find((p) => p.slug === slug) ?? null);
  const trails = park ? (await trailsToday(park)).trails.map(({ reportedAt: _r, ...t }) => t) : [];
  const pick = (p: Park) => ({ slug: p.slug, name: p.name, baseElevationM: p.baseElevationM, summitElevationM: p.summitElevationM });
  const today = park ? parkToday(park) : new Date().toISOString().slice(0, 10);
  return (
    <section className="space-y-4">
      <p><Link href="/me/rides" className="font-semibold underline">My rides</Link> › Log a ride</p>
      <h1 className="text-3xl font-extrabold">Log a ride</h1>
      <p className="max-w-prose text-loam-900">Say what you ran and how each tyre felt. You get one change to try next time: changing one thing at a time is how a baseline gets good.</p>
      {setups.length === 0 ? (
        <p className="card">Save a setup first: <Link href="/me/setups/new" className="font-semibold underline">new setup</Link>.</p>
      ) : (
        <RideLogForm
          setups={setups.map((s) => ({ id: s.id, name: s.name, baseline: s.baseline ? { frontKpa: s.baseline.frontKpa, rearKpa: s.baseline.rearKpa } : null }))}
          parks={parks.map(pick)}
          park={park ? pick(park) : null}
          trails={trails}
          today={today}
          unit={units.pressure}
        />
      )}
    </section>
  );
}
