import type { Metadata } from "next";
import Link from "next/link";
import { HazardList } from "@/components/board/hazard-list";
import { HazardForm } from "@/components/hazards/hazard-form";
import { ResolveHazardButton } from "@/components/hazards/resolve-button";
import { openHazards, trailChoices } from "@/lib/hazards/hazard-queries";
import { requireParkAccess } from "@/lib/parks/queries";
import { formatParkDateTime } from "@/lib/shared/park-clock";
import { formatDistance } from "@/lib/trails/pure/geo";
import { boundsAround } from "@/lib/map/pure/bounds";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Hazards" };

export default async function HazardsPage({ params }: { params: Promise<{ parkSlug: string }> }) {
  const { parkSlug } = await params;
  const park = await requireParkAccess(parkSlug, "hazard:write");
  const [hazards, trails] = await Promise.all([openHazards(park.id), trailChoices(park.id)]);
  return (
    <section className="space-y-4">
      <header>
        <h1 className="text-2xl font-bold">Hazards at {park.name}</h1>
        <p className="flex flex-wrap gap-x-4 text-sm font-semibold">
          <Link href={`/staff/${park.slug}/morning-check`} className="inline-flex min-h-tap items-center text-moss-700 underline">
            Morning check
          </Link>
          <Link href={`/parks/${park.slug}`} className="inline-flex min-h-tap items-center text-moss-700 underline">
            Public board
          </Link>
        </p>
      </header>
      <HazardForm parkSlug={park.slug} trails={trails} mapBounds={boundsAround(park.centerLon, park.centerLat, 0.01)} />
      <section className="card space-y-3" aria-labelledby="open-hazards">
        <h2 id="open-hazards" className="text-lg font-bold">
          Open hazards ({hazards.length})
        </h2>
        {hazards.length === 0 && <p>None open.</p>}
        <ul className="space-y-3">
          {hazards.map((h) => (
            <li key={h.id} className="space-y-2 border-b border-loam-100 pb-3">
              <p className="text-sm text-loam-600">
                {h.trailName ? `On ${h.trailName}, ${formatDistance(h.alongM ?? 0)} from its start` : "Off the trails"} · pinned {formatParkDateTime(new Date(h.reportedAt), park.timeZone)}
              </p>
              <HazardList hazards={[h]} />
              <ResolveHazardButton hazardId={h.id} lockVersion={h.lockVersion} />
            </li>
          ))}
        </ul>
      </section>
    </section>
  );
}
