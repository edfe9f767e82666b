import type { Metadata } from "next";
import Link from "next/link";
import { StaffPinMapLoader } from "@/components/map/staff-pin-map-loader";
import { getActor } from "@/lib/server/auth/actor";
import { can } from "@/lib/server/auth/permissions";
import { mapTrails, openHazards, parkTrailFeatures } from "@/lib/map/map-queries";
import { humanize } from "@/lib/map/pure/geojson";
import { boundsAround, trailBounds } from "@/lib/map/pure/bounds";
import { pinKey, type Pin } from "@/lib/map/pure/pin-moves";
import { parkDataUrls } from "@/lib/map/pure/sources";
import { requireParkAccess } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Move map pins" };

export default async function StaffMapPage({ params }: { params: Promise<{ parkSlug: string }> }) {
  const { parkSlug } = await params;
  const [actor, park] = await Promise.all([getActor(), requireParkAccess(parkSlug, ["trail:write", "hazard:write"])]);
  const [mayMoveFeatures, mayMoveHazards] = [can(actor, "trail:write", { parkId: park.id }), can(actor, "hazard:write", { parkId: park.id })];

  const [trails, { features, trailNames }, hazards] = await Promise.all([mapTrails(park.id), parkTrailFeatures(park.id), openHazards(park.id)]);
  const on = (trailId: string | null) => (trailId && trailNames.get(trailId) ? ` on ${trailNames.get(trailId)}` : "");
  const pins: Pin[] = [
    ...(mayMoveFeatures
      ? features.map((f) => ({ key: pinKey("feature", f.id), kind: "feature" as const, id: f.id, lon: f.lon, lat: f.lat, label: `${humanize(f.kind)}${f.name ? ` "${f.name}"` : ""}${on(f.trailId)}` }))
      : []),
    ...(mayMoveHazards
      ? hazards.map((h) => ({ key: pinKey("hazard", h.id), kind: "hazard" as const, id: h.id, lon: h.lon, lat: h.lat, lockVersion: h.lockVersion, label: `Hazard: ${humanize(h.kind)}${on(h.trailId)}` }))
      : []),
  ];

  return (
    <section className="space-y-4">
      <header className="flex flex-wrap items-end justify-between gap-2">
        <div>
          <h1 className="text-2xl font-bold">{park.name}: move map pins</h1>
          <p className="text-sm text-loam-700">
            {pins.length} pins: built features (white) snap onto their trail; hazard pins (amber, marked !) go exactly where you put them.
          </p>
        </div>
        <nav aria-label="Park pages" className="flex gap-2">
          <Link href={`/parks/${park.slug}/map`} className="btn-quiet">Rider&apos;s map</Link>
          <Link href={`/staff/${park.slug}`} className="btn-quiet">Staff desk</Link>
        </nav>
      </header>
      <StaffPinMapLoader styleUrl={parkDataUrls(park.slug).style} bounds={trailBounds(trails) ?? boundsAround(park.centerLon, park.centerLat)} pins={pins} />
    </section>
  );
}
