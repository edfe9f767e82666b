import Link from "next/link";
import { listParks } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";

export default async function HomePage() {
  const parks = await listParks();
  return (
    <section className="space-y-6">
      <div className="space-y-2">
        <h1 className="text-3xl font-extrabold tracking-tight">Before you drive up</h1>
        <p className="max-w-prose text-lg text-loam-700">
          Which trails are open, what the ground is like this morning, and the tyre pressure to run on them.
        </p>
      </div>
      <ul className="grid gap-4 sm:grid-cols-2">
        {parks.map((park) => (
          <li key={park.slug} className="card space-y-2">
            <h2 className="text-xl font-bold">{park.name}</h2>
            {park.fictional && <p className="text-xs font-semibold uppercase tracking-wide text-flare-700">Fictional demo park</p>}
            <p className="text-sm text-loam-600">
              Base {park.baseElevationM} m · summit {park.summitElevationM} m · {park.timeZone}
            </p>
            <div className="flex flex-wrap gap-2">
              <Link href={`/parks/${park.slug}`} className="btn-primary">Today&apos;s conditions</Link>
            </div>
          </li>
        ))}
      </ul>
    </section>
  );
}
